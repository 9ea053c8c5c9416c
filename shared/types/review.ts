import type { NetworkDocument } from '../network/types'
import type { ProjectRole, StoredFileSummary } from './api'
import type { SnapshotSummary } from '../review/snapshot-summary'
import type { DocumentDiff } from '../review/document-diff'
import type { UnmatchedMention } from '../review/mentions'

export type { SnapshotSummary } from '../review/snapshot-summary'
export type { DocumentDiff, DiffEntry } from '../review/document-diff'
export type { UnmatchedMention } from '../review/mentions'

/**
 * A review's state. Ours: waiting for the chosen reviewers, cleared by all of them,
 * sent back by one of them, or withdrawn by an editor before it was decided.
 */
export const reviewStates = ['awaiting', 'cleared', 'sent-back', 'withdrawn'] as const
export type ReviewState = (typeof reviewStates)[number]

/** Words for each state, as pages and e-mails show them. */
export const reviewStateLabels: Record<ReviewState, string> = {
  'awaiting': 'Awaiting reviewers',
  'cleared': 'Cleared to proceed',
  'sent-back': 'Sent back for rework',
  'withdrawn': 'Withdrawn',
}

/** What one reviewer decides: let the design go on, or send it back. */
export const reviewDecisions = ['clear', 'send-back'] as const
export type ReviewDecision = (typeof reviewDecisions)[number]

export const reviewDecisionLabels: Record<ReviewDecision, string> = {
  'clear': 'cleared the design',
  'send-back': 'sent the design back',
}

export type ReviewEventKind = 'requested' | ReviewDecision | 'withdrawn'

/** Someone as other people see them; null where the account has been deleted. */
export interface PersonDto {
  id: string
  name: string
  email: string
}

/** Where a comment points: the whole snapshot, one block, or a frequency band (Hz) of the plots. */
export type CommentAnchor =
  | { kind: 'snapshot' }
  | { kind: 'block'; blockId: string }
  | { kind: 'band'; low: number; high: number }

/** The latest review of a snapshot, in lists. */
export interface ReviewBriefDto {
  id: string
  state: ReviewState
}

/** A snapshot in a list: who froze it, when, and its solver summary. */
export interface SnapshotListItemDto {
  id: string
  networkId: string
  title: string
  note: string
  networkRevision: number
  createdAt: string
  author: PersonDto | null
  summary: SnapshotSummary
  latestReview: ReviewBriefDto | null
  openComments: number
}

/** One snapshot with its frozen document. */
/**
 * What a snapshot froze besides its own document: the networks it uses as sub-networks (by the
 * reference its blocks use, transitively) and its copies of the data files they read.
 */
export interface FrozenPartsDto {
  networks: Array<[string, NetworkDocument]>
  /** The copies' names, the version each file had when frozen, the project file it came from (null once deleted). */
  files: Array<{ name: string; fileId: string | null; version: number; summary: StoredFileSummary }>
}

export interface SnapshotDto extends SnapshotListItemDto {
  projectId: string
  networkName: string
  document: NetworkDocument
  /** Its frozen inner networks and data files; null for a snapshot made before snapshots kept them (it reads the live ones). */
  frozen: FrozenPartsDto | null
  /** The caller's role in the project, so pages can offer what it allows. */
  role: ProjectRole
}

export interface CommentDto {
  id: string
  snapshotId: string
  parentId: string | null
  author: PersonDto | null
  body: string
  anchor: CommentAnchor
  mentions: PersonDto[]
  resolvedAt: string | null
  resolvedBy: PersonDto | null
  createdAt: string
  updatedAt: string
  edited: boolean
  /** Only in the answer to posting or editing: mentions that matched no single member, so nobody was told. */
  unmatchedMentions?: UnmatchedMention[]
}

export interface ReviewerDto {
  person: PersonDto
  decision: ReviewDecision | null
  note: string
  decidedAt: string | null
}

export interface ReviewEventDto {
  kind: ReviewEventKind
  actor: PersonDto | null
  note: string
  at: string
}

export interface ReviewDto {
  id: string
  snapshotId: string
  state: ReviewState
  message: string
  requestedBy: PersonDto | null
  createdAt: string
  closedAt: string | null
  reviewers: ReviewerDto[]
  history: ReviewEventDto[]
}

/** One side of a comparison: a snapshot, or the live network as saved now. */
export interface CompareSideDto {
  kind: 'snapshot' | 'live'
  id: string
  label: string
  document: NetworkDocument
  /** The inner networks and data files this side is solved with (a snapshot's frozen ones, or the live ones now); null: read the live ones. */
  parts: FrozenPartsDto | null
  /** The live network's revision, for a restore that must not overwrite newer work. */
  revision?: number
}

export interface CompareDto {
  before: CompareSideDto
  after: CompareSideDto
  diff: DocumentDiff
}

/** Answer of a restore: the network as now saved and the snapshot that keeps what it replaced. */
export interface RestoreResultDto {
  networkId: string
  revision: number
  keptAsSnapshotId: string
}

export type InvitationStatus = 'pending' | 'accepted' | 'expired' | 'revoked'

export interface InvitationDto {
  id: string
  email: string
  role: ProjectRole
  status: InvitationStatus
  invitedBy: PersonDto | null
  createdAt: string
  expiresAt: string
}

/** What the holder of an invitation link may see before accepting. */
export interface InvitationPreviewDto {
  projectName: string
  email: string
  role: ProjectRole
  invitedByName: string | null
  status: InvitationStatus
  expiresAt: string
}

export interface InvitationAcceptedDto {
  projectId: string
  role: ProjectRole
  /** True when the account was already a member: its role is left as it was. */
  alreadyMember: boolean
}

export interface OutboxMessageBriefDto {
  id: string
  from: string
  to: string[]
  subject: string
  receivedAt: string
}

export interface OutboxMessageDto extends OutboxMessageBriefDto {
  text: string
  html: string
}

export interface AuditEventDto {
  id: number
  action: string
  actor: PersonDto | null
  /** The member an event is about (role changes, additions, removals), when it names one. */
  subject: PersonDto | null
  detail: Record<string, unknown>
  createdAt: string
}

/** A review in the project's list, with what it is about. */
export interface ProjectReviewDto extends ReviewDto {
  snapshotTitle: string
  networkId: string
  networkName: string
}
