import { z } from 'zod'
import { Op } from 'sequelize'
import { invitationTokenSchema } from '../../../../shared/schemas/review'
import { Invitation, Membership } from '../../../database/models'
import type { InvitationAcceptedDto } from '../../../../shared/types/review'

/**
 * Accepts an invitation for the signed-in account, which joins the project with the
 * invited role. The link works once: the claim is one conditional UPDATE, so two
 * accepts racing each other cannot both succeed. Used, withdrawn and expired links
 * answer 410 saying which.
 */
export default defineEventHandler(async (event): Promise<InvitationAcceptedDto> => {
  const { token } = paramsAs(event, z.object({ token: invitationTokenSchema }))
  const user = await requireCurrentUser(event)
  const tokenHash = hashInvitationToken(token)
  const outcome = await useDatabase().transaction(async (transaction) => {
    const [claimed, rows] = await Invitation.update(
      { acceptedAt: new Date(), acceptedBy: user.id },
      { where: { tokenHash, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } }, returning: true, transaction },
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
