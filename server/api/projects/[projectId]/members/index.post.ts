import { addMemberSchema } from '#shared/schemas/project'
import { Membership, User } from '~~/server/database/models'
import { memberAddedMail } from '~~/server/mail/messages'

/** Adds an existing account to the project by e-mail (owners); the new member gets a notice by e-mail. */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'owner')
  const body = await readBodyAs(event, addMemberSchema)
  const invitee = await User.findOne({ where: { email: body.email } })
  if (!invitee) {
    throw createError({ statusCode: 404, message: `No account uses ${body.email}; ask them to sign up first.`, data: { fields: { email: 'No account with this e-mail.' } } })
  }
  const existing = await Membership.findOne({ where: { projectId: project.id, userId: invitee.id } })
  if (existing) {
    throw createError({ statusCode: 409, message: `${invitee.name} is already a member (${existing.role}).`, data: { fields: { email: 'Already a member.' } } })
  }
  await Membership.create({ projectId: project.id, userId: invitee.id, role: body.role })
  await recordAudit('member.added', user.id, project.id, { userId: invitee.id, role: body.role })
  // Sent after the membership is stored; a failed send is logged by sendMail and never undoes it.
  await sendMail(invitee.email, memberAddedMail({ adderName: user.name, projectName: project.name, role: body.role, url: appLink(event, `/projects/${project.id}`) }))
  setResponseStatus(event, 201)
  return { userId: invitee.id, email: invitee.email, name: invitee.name, role: body.role }
})
