import { createHash, randomBytes } from 'node:crypto'
import type { Invitation } from '~~/server/database/models'
import type { InvitationDto, InvitationStatus, PersonDto } from '#shared/types/review'

/** How long an invitation link works. */
export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000

/** A new random link token (32 bytes, URL-safe) and the hash that is stored in its place. */
export function newInvitationToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url')
  return { token, hash: hashInvitationToken(token) }
}

export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}

export function invitationStatus(invitation: Invitation, now = new Date()): InvitationStatus {
  if (invitation.acceptedAt) return 'accepted'
  if (invitation.revokedAt) return 'revoked'
  if (invitation.expiresAt.getTime() <= now.getTime()) return 'expired'
  return 'pending'
}

export function toInvitationDto(invitation: Invitation, people: Map<string, PersonDto>): InvitationDto {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    status: invitationStatus(invitation),
    invitedBy: invitation.invitedBy ? people.get(invitation.invitedBy) ?? null : null,
    createdAt: invitation.createdAt.toISOString(),
    expiresAt: invitation.expiresAt.toISOString(),
  }
}

/** Why a link no longer works, in words the accept page shows as they are. */
export function refusalFor(status: InvitationStatus, invitation: Invitation): string {
  switch (status) {
    case 'accepted': return 'This invitation has already been used. Each link works once; ask the project owner for a new one if you still need access.'
    case 'revoked': return 'This invitation was withdrawn by the project owner.'
    case 'expired': return `This invitation expired on ${invitation.expiresAt.toUTCString()}. Ask the project owner to invite you again.`
    default: return ''
  }
}
