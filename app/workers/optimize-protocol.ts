/** Messages between the editor and its optimiser worker. */
import type { NetworkDocument, ParamValue, Problem } from '../../shared/network/types'

export interface OptimizeRequest {
  runId: number
  document: NetworkDocument
  seed: number
  maxEvaluations: number
}

/** What changed: each tunable's KEY and its value as it goes into the document. */
export interface TunedValue {
  key: string
  block?: string
  param?: string
  variable?: string
  value: ParamValue
}

export type OptimizeReply =
  | { runId: number, kind: 'done', met: boolean, evaluations: number, values: TunedValue[] }
  | { runId: number, kind: 'failed', problems: Problem[] }
