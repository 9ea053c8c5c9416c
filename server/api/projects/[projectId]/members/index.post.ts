import { addMemberSchema } from '../../../../../shared/schemas/project'
import { Membership, User } from '../../../../database/models'

/** Adds an existing account to the project by e-mail (owners). */
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
  setResponseStatus(event, 201)
  return { userId: invitee.id, email: invitee.email, name: invitee.name, role: body.role }
})
