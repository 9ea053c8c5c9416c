import { z } from 'zod'
import { reviewDecisions } from '../types/review'
import { roleSchema } from './project'

const uuid = (what: string) => z.uuid({ message: `${what} must be a UUID.` })

/** Body of freezing a snapshot; `revision`, when given, must be the network's current one. */
export const createSnapshotSchema = z.object({
  title: z.string().trim().min(1, 'Give the snapshot a title.').max(200, 'Title is too long (200 characters at most).'),
  note: z.string().trim().max(5000, 'Note is too long (5000 characters at most).').default(''),
  revision: z.number().int().positive().optional(),
  /** false: refuse (422, nothing stored) when the network does not solve, so the caller can ask the user to confirm. */
  allowUnsolved: z.boolean().default(true),
})

/** Where a comment points; a band needs low < high, both positive frequencies in Hz. */
export const commentAnchorSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('snapshot') }),
  z.object({ kind: z.literal('block'), blockId: z.string().min(1, 'Name the block.').max(100) }),
  z.object({ kind: z.literal('band'), low: z.number().positive().finite(), high: z.number().positive().finite() })
    .refine(a => a.low < a.high, { message: 'The band\'s low edge must be below its high edge.', path: ['high'] }),
], { message: 'anchor.kind must be snapshot, block or band.' })

const commentBody = z.string().trim().min(1, 'Write something.').max(10_000, 'Comment is too long (10000 characters at most).')

/** Body of a new comment or reply; replies take their thread's anchor. */
export const createCommentSchema = z.object({
  body: commentBody,
  anchor: commentAnchorSchema.default({ kind: 'snapshot' }),
  parentId: uuid('parentId').optional(),
})

/** Body of editing a comment (its author) or resolving / reopening a thread. */
export const updateCommentSchema = z.object({
  body: commentBody.optional(),
  resolved: z.boolean().optional(),
}).refine(v => v.body !== undefined || v.resolved !== undefined, { message: 'Nothing to change: give a body or resolved.' })

/** Body of asking members to review a snapshot. */
export const requestReviewSchema = z.object({
  reviewerIds: z.array(uuid('Each reviewer id')).min(1, 'Choose at least one reviewer.').max(50, 'Too many reviewers (50 at most).'),
  message: z.string().trim().max(5000, 'Message is too long (5000 characters at most).').default(''),
  /** false: refuse (422, nothing stored) when the snapshot does not solve, so the caller can ask the user to confirm. */
  allowUnsolved: z.boolean().default(true),
})

/** Body of a reviewer's decision. */
export const decideReviewSchema = z.object({
  decision: z.enum(reviewDecisions, { message: `decision must be one of: ${reviewDecisions.join(', ')}.` }),
  note: z.string().trim().max(5000, 'Note is too long (5000 characters at most).').default(''),
})

/** Body of withdrawing a review. */
export const withdrawReviewSchema = z.object({
  note: z.string().trim().max(5000, 'Note is too long (5000 characters at most).').default(''),
})

/** Body of restoring a snapshot: the live network's revision the caller has seen. */
export const restoreSnapshotSchema = z.object({
  revision: z.number({ message: 'revision must be the live network\'s revision.' }).int().positive(),
})

/** Query of a comparison: another snapshot's id, or "live" for the network as saved now. */
export const compareQuerySchema = z.object({
  with: z.union([z.literal('live'), uuid('with')], { message: 'with must be a snapshot id or "live".' }),
})

/** Body of inviting someone by e-mail. */
export const inviteSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter a valid e-mail address.' })),
  role: roleSchema,
})

/** An invitation token from a link: 43 URL-safe characters (32 random bytes). */
export const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'This invitation link is not valid.')
