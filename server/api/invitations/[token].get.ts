import { z } from 'zod'
import { invitationTokenSchema } from '#shared/schemas/review'
import { Invitation, Project, User } from '~~/server/database/models'
import type { InvitationPreviewDto } from '#shared/types/review'

/**
 * What an invitation link is for, shown before accepting. Public by design: holding the
 * link is the right to see it. A used, withdrawn or expired link still answers, with its
 * status, so the page can say clearly why it no longer works.
 */
export default defineEventHandler(async (event): Promise<InvitationPreviewDto> => {
  const { token } = paramsAs(event, z.object({ token: invitationTokenSchema }))
  const invitation = await Invitation.findOne({ where: { tokenHash: hashInvitationToken(token) } })
  const project = invitation && await Project.findByPk(invitation.projectId, { attributes: ['name'] })
  if (!invitation || !project) throw createError({ statusCode: 404, message: 'This invitation link is not valid. Check that you copied all of it.' })
  const inviter = invitation.invitedBy ? await User.findByPk(invitation.invitedBy, { attributes: ['name'] }) : null
  return {
    projectName: project.name,
    email: invitation.email,
    role: invitation.role,
    invitedByName: inviter?.name ?? null,
    status: invitationStatus(invitation),
    expiresAt: invitation.expiresAt.toISOString(),
  }
})
