import type { NetworkDocument } from '../network/types'
import type { PersonDto } from './review'

/** Why a checkpoint was written. */
export const checkpointReasons = ['editing', 'session-end', 'save', 'snapshot-restore', 'checkpoint-restore', 'before-change'] as const
export type CheckpointReason = (typeof checkpointReasons)[number]

/** Words for each reason, as the History page shows them. */
export const checkpointReasonLabels: Record<CheckpointReason, string> = {
  'editing': 'During live editing',
  'session-end': 'Last editor left',
  'save': 'Saved',
  'snapshot-restore': 'Snapshot restored',
  'checkpoint-restore': 'Checkpoint restored',
  'before-change': 'Kept before it was replaced',
}

/** A checkpoint in the list: when, why, who changed the network since the one before, and its size. */
export interface CheckpointListItemDto {
  id: string
  networkId: string
  createdAt: string
  revision: number
  reason: CheckpointReason
  editors: PersonDto[]
  blockCount: number
}

/** One checkpoint with its document. */
export interface CheckpointDto extends CheckpointListItemDto {
  document: NetworkDocument
}

/** Answer of restoring a checkpoint: the network's new revision and the checkpoint that keeps what it replaced. */
export interface CheckpointRestoreResultDto {
  networkId: string
  revision: number
  keptAsCheckpointId: string | null
}
