import { inviteSchema } from '#shared/schemas/review'
import { Invitation, Membership, User } from '~~/server/database/models'
import { invitationMail } from '~~/server/mail/messages'
import type { InvitationDto } from '#shared/types/review'

/**
 * Invites someone by e-mail with a role (owners), whether or not they have an account.
 * The link's token is mailed and never stored; an earlier pending invitation to the same
 * address is withdrawn, so only the newest link works.
 */
export default defineEventHandler(async (event): Promise<InvitationDto> => {
  const { user, project } = await requireProjectRole(event, 'owner')
  const body = await readBodyAs(event, inviteSchema)
  const existing = await User.findOne({ where: { email: body.email }, attributes: ['id', 'name'] })
  const member = existing && await Membership.findOne({ where: { projectId: project.id, userId: existing.id } })
  if (member) {
    throw createError({ statusCode: 409, message: `${existing!.name} is already a member (${member.role}).`, data: { fields: { email: 'Already a member.' } } })
  }
  const { token, hash } = newInvitationToken()
  const invitation = await useDatabase().transaction(async (transaction) => {
    await Invitation.update(
      { revokedAt: new Date() },
      { where: { projectId: project.id, email: body.email, acceptedAt: null, revokedAt: null }, transaction },
    )
    // One clock reading for both times, so the link lives exactly the stated seven days.
    const sentAt = new Date()
    return Invitation.create({
      projectId: project.id, email: body.email, role: body.role, tokenHash: hash, invitedBy: user.id,
      createdAt: sentAt, expiresAt: new Date(sentAt.getTime() + INVITATION_LIFETIME_MS),
    }, { transaction })
  })
  await recordAudit('invitation.sent', user.id, project.id, { invitationId: invitation.id, email: body.email, role: body.role })
  await sendMail(body.email, invitationMail({
    inviterName: user.name, projectName: project.name, role: body.role, url: appLink(event, appPaths.invitation(token)), expiresAt: invitation.expiresAt,
  }))
  setResponseStatus(event, 201)
  return toInvitationDto(invitation, await peopleById([user.id]))
})
