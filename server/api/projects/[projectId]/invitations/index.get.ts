import { Invitation } from '~~/server/database/models'
import type { InvitationDto } from '#shared/types/review'

/** The project's invitations, newest first, with their status (owners). */
export default defineEventHandler(async (event): Promise<InvitationDto[]> => {
  const { project } = await requireProjectRole(event, 'owner')
  const invitations = await Invitation.findAll({ where: { projectId: project.id }, order: [['createdAt', 'DESC']], limit: 200 })
  const people = await peopleById(invitations.map(i => i.invitedBy))
  return invitations.map(i => toInvitationDto(i, people))
})
