import type { H3Event } from 'h3'
import { z } from 'zod'
import { Comment, Network, Review, ReviewEvent, ReviewReviewer, Snapshot, User, type Project } from '~~/server/database/models'
import type { NetworkDocument } from '#shared/network/types'
import type {
  CommentAnchor, CommentDto, PersonDto, ReviewDto, SnapshotListItemDto, SnapshotSummary,
} from '#shared/types/review'
import { findMentions, findUnmatchedMentions, type UnmatchedMention } from '#shared/review/mentions'
import { formatHz } from '#shared/review/summary-lines'
import { mentionMail } from '~~/server/mail/messages'
import { listMembers } from './members'
import { gatherSnapshotParts, summariseWithParts } from './snapshot-parts'

/** Loads a snapshot of the given project from the route's `snapshotId`; 404 when it is not there. */
export async function requireSnapshot(event: H3Event, projectId: string): Promise<{ snapshot: Snapshot; network: Network }> {
  const { snapshotId } = paramsAs(event, z.object({ snapshotId: z.uuid() }))
  const snapshot = await Snapshot.findByPk(snapshotId)
  const network = snapshot && await Network.findOne({ where: { id: snapshot.networkId, projectId }, attributes: { exclude: ['document'] } })
  if (!snapshot || !network) throw createError({ statusCode: 404, message: 'Snapshot not found.' })
  return { snapshot, network }
}

/** Loads a review of the given project from the route's `reviewId`; 404 when it is not there. */
export async function requireReview(event: H3Event, projectId: string): Promise<Review> {
  const { reviewId } = paramsAs(event, z.object({ reviewId: z.uuid() }))
  const review = await Review.findOne({ where: { id: reviewId, projectId } })
  if (!review) throw createError({ statusCode: 404, message: 'Review not found.' })
  return review
}

/** Loads a comment of the given project from the route's `commentId`; 404 when it is not there. */
export async function requireComment(event: H3Event, projectId: string): Promise<{ comment: Comment; snapshot: Snapshot; network: Network }> {
  const { commentId } = paramsAs(event, z.object({ commentId: z.uuid() }))
  const comment = await Comment.findByPk(commentId)
  const snapshot = comment && await Snapshot.findByPk(comment.snapshotId, { attributes: { exclude: ['document', 'networks'] } })
  const network = snapshot && await Network.findOne({ where: { id: snapshot.networkId, projectId }, attributes: { exclude: ['document'] } })
  if (!comment || !snapshot || !network) throw createError({ statusCode: 404, message: 'Comment not found.' })
  return { comment, snapshot, network }
}

/** People by id, for the DTOs' author and actor fields. */
export async function peopleById(ids: Array<string | null | undefined>): Promise<Map<string, PersonDto>> {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))]
  if (!wanted.length) return new Map()
  const users = await User.findAll({ where: { id: wanted }, attributes: ['id', 'name', 'email'] })
  return new Map(users.map(u => [u.id, { id: u.id, name: u.name, email: u.email }]))
}

/**
 * The snapshot summary of a document, with subnetworks and data files taken from the same
 * project as they are now (by id or by name), as the editor resolves them.
 */
export async function summariseDocument(projectId: string, document: NetworkDocument): Promise<SnapshotSummary> {
  return summariseWithParts(document, await gatherSnapshotParts(projectId, document))
}

/** List entries for snapshots, with their latest review and open comment threads. */
export async function snapshotListItems(snapshots: Snapshot[]): Promise<SnapshotListItemDto[]> {
  const ids = snapshots.map(s => s.id)
  const people = await peopleById(snapshots.map(s => s.createdBy))
  const reviews = ids.length ? await Review.findAll({ where: { snapshotId: ids }, order: [['createdAt', 'DESC']], attributes: ['id', 'snapshotId', 'state'] }) : []
  const latest = new Map<string, Review>()
  for (const r of reviews) if (!latest.has(r.snapshotId)) latest.set(r.snapshotId, r)
  const open = ids.length
    ? await Comment.count({ where: { snapshotId: ids, parentId: null, resolvedAt: null }, group: ['snapshotId'] }) as unknown as Array<{ snapshotId: string; count: number }>
    : []
  const openBy = new Map(open.map(o => [o.snapshotId, Number(o.count)]))
  return snapshots.map(s => ({
    id: s.id,
    networkId: s.networkId,
    title: s.title,
    note: s.note,
    networkRevision: s.networkRevision,
    createdAt: s.createdAt.toISOString(),
    author: s.createdBy ? people.get(s.createdBy) ?? null : null,
    summary: s.summary as unknown as SnapshotSummary,
    latestReview: latest.has(s.id) ? { id: latest.get(s.id)!.id, state: latest.get(s.id)!.state } : null,
    openComments: openBy.get(s.id) ?? 0,
  }))
}

/** Comments as DTOs, oldest first. */
export async function toCommentDtos(comments: Comment[]): Promise<CommentDto[]> {
  const people = await peopleById(comments.flatMap(c => [c.authorId, c.resolvedBy, ...(c.mentions ?? [])]))
  const person = (id: string | null | undefined) => (id ? people.get(id) ?? null : null)
  return comments.map(c => ({
    id: c.id,
    snapshotId: c.snapshotId,
    parentId: c.parentId,
    author: person(c.authorId),
    body: c.body,
    anchor: c.anchor as unknown as CommentAnchor,
    mentions: (c.mentions ?? []).map(id => people.get(id)).filter((p): p is PersonDto => !!p),
    resolvedAt: c.resolvedAt ? c.resolvedAt.toISOString() : null,
    resolvedBy: person(c.resolvedBy),
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
    edited: c.editedAt !== null && c.editedAt !== undefined,
  }))
}

/** Reviews as DTOs with their reviewers and history, newest first. */
export async function toReviewDtos(reviews: Review[]): Promise<ReviewDto[]> {
  const ids = reviews.map(r => r.id)
  const [reviewers, events] = ids.length
    ? await Promise.all([
        ReviewReviewer.findAll({ where: { reviewId: ids } }),
        ReviewEvent.findAll({ where: { reviewId: ids }, order: [['createdAt', 'ASC'], ['id', 'ASC']] }),
      ])
    : [[], []]
  const people = await peopleById([...reviews.map(r => r.requestedBy), ...reviewers.map(r => r.userId), ...events.map(e => e.actorId)])
  return reviews.map(r => ({
    id: r.id,
    snapshotId: r.snapshotId,
    state: r.state,
    message: r.message,
    requestedBy: r.requestedBy ? people.get(r.requestedBy) ?? null : null,
    createdAt: r.createdAt.toISOString(),
    closedAt: r.closedAt ? r.closedAt.toISOString() : null,
    reviewers: reviewers.filter(x => x.reviewId === r.id && people.has(x.userId)).map(x => ({
      person: people.get(x.userId)!,
      decision: x.decision,
      note: x.note,
      decidedAt: x.decidedAt ? x.decidedAt.toISOString() : null,
    })).sort((a, b) => a.person.name.localeCompare(b.person.name)),
    history: events.filter(e => e.reviewId === r.id).map(e => ({
      kind: e.kind,
      actor: e.actorId ? people.get(e.actorId) ?? null : null,
      note: e.note,
      at: e.createdAt.toISOString(),
    })),
  }))
}

/** Pages of the app that e-mails link to. */
export const appPaths = {
  snapshot: (projectId: string, networkId: string, snapshotId: string, focus?: string) =>
    `/projects/${projectId}/snapshots/${networkId}/${snapshotId}${focus ? `?focus=${focus}` : ''}`,
  invitation: (token: string) => `/invitations/${token}`,
}

/** Members a comment body mentions, other than its author. */
export async function mentionedMembers(projectId: string, body: string, authorId: string): Promise<string[]> {
  return (await readMentions(projectId, body, authorId)).mentioned
}

/** Members a comment body mentions (other than its author), and the mentions that matched no single member. */
export async function readMentions(projectId: string, body: string, authorId: string): Promise<{ mentioned: string[]; unmatched: UnmatchedMention[] }> {
  const members = (await listMembers(projectId)).map(m => ({ id: m.userId, email: m.email }))
  return { mentioned: findMentions(body, members).filter(id => id !== authorId), unmatched: findUnmatchedMentions(body, members) }
}

/** Mails each mentioned member once, with the comment and a link to its thread. */
export async function mailMentions(event: H3Event, input: {
  project: Project; network: Network; snapshot: Snapshot; comment: Comment; author: User; mentioned: string[]
}): Promise<void> {
  if (!input.mentioned.length) return
  const people = await peopleById(input.mentioned)
  const anchor = input.comment.anchor as unknown as CommentAnchor
  const where = anchor.kind === 'block' ? `block ${anchor.blockId}` : anchor.kind === 'band' ? `${formatHz(anchor.low)} – ${formatHz(anchor.high)}` : 'the whole snapshot'
  const url = appLink(event, appPaths.snapshot(input.project.id, input.network.id, input.snapshot.id, input.comment.parentId ?? input.comment.id))
  for (const id of input.mentioned) {
    const person = people.get(id)
    if (!person) continue
    await sendMail(person.email, mentionMail({
      authorName: input.author.name, projectName: input.project.name, snapshotTitle: input.snapshot.title, where, body: input.comment.body, url,
    }))
  }
}

/** The 422 that asks the user to confirm freezing or sending for review a network that does not solve. */
export function unsolvedRefusal(what: 'network' | 'snapshot', problem: string | undefined) {
  const reason = (problem ?? 'the solver could not solve it').replace(/\.+$/, '')
  return createError({
    statusCode: 422,
    message: `This ${what} does not solve: ${reason}. ${what === 'network' ? 'Freeze it anyway' : 'Send it for review anyway'} only if that is what you want looked at.`,
    data: { unsolved: { problem: reason } },
  })
}

/** Audit detail naming a summary's problem when it did not solve; empty when it did. */
export function unsolvedDetail(summary: SnapshotSummary): Record<string, unknown> {
  return summary.solved ? {} : { unsolved: summary.problem ?? 'not solved' }
}
