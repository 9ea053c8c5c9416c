import { z } from 'zod'
import { Invitation } from '~~/server/database/models'
import type { InvitationDto } from '#shared/types/review'

/** Withdraws an invitation that has not been used yet (owners); its link stops working. */
export default defineEventHandler(async (event): Promise<InvitationDto> => {
  const { invitationId } = paramsAs(event, z.object({ invitationId: z.uuid() }))
  const { user, project } = await requireProjectRole(event, 'owner')
  const invitation = await Invitation.findOne({ where: { id: invitationId, projectId: project.id } })
  if (!invitation) throw createError({ statusCode: 404, message: 'Invitation not found.' })
  const status = invitationStatus(invitation)
  if (status !== 'pending') throw createError({ statusCode: 409, message: `This invitation is ${status} already; there is nothing to withdraw.` })
  await invitation.update({ revokedAt: new Date() })
  await recordAudit('invitation.revoked', user.id, project.id, { invitationId: invitation.id, email: invitation.email, role: invitation.role })
  return toInvitationDto(invitation, await peopleById([invitation.invitedBy]))
})
