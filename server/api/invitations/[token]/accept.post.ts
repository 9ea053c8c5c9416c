import { z } from 'zod'
import { Op, col, fn, where } from 'sequelize'
import { invitationTokenSchema } from '#shared/schemas/review'
import { Invitation, Membership } from '~~/server/database/models'
import type { InvitationAcceptedDto } from '#shared/types/review'
import { maskEmail } from '#shared/account/mask-email'

/**
 * Accepts an invitation for the signed-in account, which joins the project with the
 * invited role. Only the account whose e-mail is the invited address may accept
 * (case-insensitive): anyone else holding the link gets 403 naming the address,
 * partly hidden, and what to do. The link works once: the claim is one conditional UPDATE, so two
 * accepts racing each other cannot both succeed. Used, withdrawn and expired links
 * answer 410 saying which.
 */
export default defineEventHandler(async (event): Promise<InvitationAcceptedDto> => {
  const { token } = paramsAs(event, z.object({ token: invitationTokenSchema }))
  const user = await requireCurrentUser(event)
  const tokenHash = hashInvitationToken(token)
  const invited = await Invitation.findOne({ where: { tokenHash } })
  if (invited && invitationStatus(invited) === 'pending' && invited.email.toLowerCase() !== user.email.toLowerCase()) {
    const address = maskEmail(invited.email)
    throw createError({
      statusCode: 403,
      message: `This invitation is for ${address}, and you are signed in as ${user.email}. Sign out, then open the link again and sign in or create an account with ${address}; or ask the project owner to invite ${user.email}.`,
      data: { invitedAddress: address },
    })
  }
  const outcome = await useDatabase().transaction(async (transaction) => {
    const [claimed, rows] = await Invitation.update(
      { acceptedAt: new Date(), acceptedBy: user.id },
      { where: { tokenHash, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() }, [Op.and]: [where(fn('lower', col('email')), user.email.toLowerCase())] }, returning: true, transaction },
    )
    if (claimed === 0) return null
    const invitation = rows[0]!
    const existing = await Membership.findOne({ where: { projectId: invitation.projectId, userId: user.id }, transaction })
    if (!existing) await Membership.create({ projectId: invitation.projectId, userId: user.id, role: invitation.role }, { transaction })
    return { invitation, existing }
  })
  if (!outcome) {
    const invitation = await Invitation.findOne({ where: { tokenHash } })
    if (!invitation) throw createError({ statusCode: 404, message: 'This invitation link is not valid. Check that you copied all of it.' })
    throw createError({ statusCode: 410, message: refusalFor(invitationStatus(invitation), invitation), data: { status: invitationStatus(invitation) } })
  }
  const { invitation, existing } = outcome
  await recordAudit('invitation.accepted', user.id, invitation.projectId, {
    invitationId: invitation.id, email: invitation.email, acceptedAs: user.email, role: existing ? existing.role : invitation.role, alreadyMember: !!existing,
  })
  return { projectId: invitation.projectId, role: existing ? existing.role : invitation.role, alreadyMember: !!existing }
})
