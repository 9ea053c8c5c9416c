/** Messages between the editor and a tolerance worker: each worker runs one range of trial indices. */
import type { NetworkDocument, Problem } from '../../shared/network/types'
import type { TraceSpec } from '../../shared/tuning/trace-values'

export interface ToleranceRequest {
  runId: number
  document: NetworkDocument
  seed: number
  from: number
  to: number
  traces: TraceSpec[]
  /** Keys whose spread is drawn; absent: every tolerance. */
  active?: string[]
}

export type ToleranceReply =
  | { runId: number, kind: 'progress', done: number }
  | { runId: number, kind: 'done', from: number, to: number, passed: number, unsolved: number, frequencies: Float64Array, traces: Float64Array[] }
  | { runId: number, kind: 'failed', problems: Problem[] }
