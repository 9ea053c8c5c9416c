import type { AuditEventDto } from '~~/shared/types/review'
import { reviewDecisionLabels, reviewStateLabels, type ReviewDecision, type ReviewState } from '~~/shared/types/review'

const text = (v: unknown) => (typeof v === 'string' || typeof v === 'number' ? String(v) : '')

/** One audit event in words, after the actor's name: "changed Jun Marlowe's role from viewer to reviewer". */
export function describeAuditEvent(e: AuditEventDto): string {
  const d = e.detail
  const who = e.subject?.name ?? 'a former member'
  switch (e.action) {
    case 'project.created': return `created the project “${text(d.name)}”`
    case 'project.updated': return `renamed the project from “${text(d.from)}” to “${text(d.to)}”`
    case 'member.added': return `added ${who} as ${text(d.role)}`
    case 'member.role-changed': return `changed ${who}'s role from ${text(d.from)} to ${text(d.to)}`
    case 'member.removed': return `removed ${who} (${text(d.role)})`
    case 'network.created': return `created the network “${text(d.name)}”`
    case 'network.deleted': return `deleted the network “${text(d.name)}”`
    case 'snapshot.created': return `froze revision ${text(d.revision)} as the snapshot “${text(d.title)}”${d.unsolved ? ` (it does not solve: ${text(d.unsolved)})` : ''}`
    case 'snapshot.restored': return `restored the snapshot “${text(d.title)}” as the live network (revision ${text(d.revision)})`
    case 'checkpoint.restored': return `restored the history checkpoint of ${text(d.checkpointAt).slice(0, 16).replace('T', ' ')} UTC as the live network (revision ${text(d.revision)})`
    case 'review.requested': return `asked ${Array.isArray(d.reviewerIds) ? d.reviewerIds.length : 'some'} member(s) to review “${text(d.title)}”${d.unsolved ? ` (it does not solve: ${text(d.unsolved)})` : ''}`
    case 'review.decided': return `${reviewDecisionLabels[d.decision as ReviewDecision] ?? text(d.decision)} in the review of “${text(d.title)}”; it is now ${(reviewStateLabels[d.state as ReviewState] ?? text(d.state)).toLowerCase()}`
    case 'review.withdrawn': return 'withdrew a review'
    case 'invitation.sent': return `invited ${text(d.email)} as ${text(d.role)}`
    case 'invitation.revoked': return `withdrew the invitation of ${text(d.email)}`
    case 'invitation.accepted': return d.alreadyMember
      ? `used the invitation sent to ${text(d.email)} (already a member, role unchanged)`
      : `joined as ${text(d.role)} with the invitation sent to ${text(d.email)}`
    default: return e.action
  }
}
