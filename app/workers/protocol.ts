/** Messages between the editor and its solve worker. */
import type { Evaluated, NetworkDocument, Problem } from '../../shared/network/types'
import type { DataSet } from '../../shared/solver/types'

export interface SolveRequest {
  seq: number
  document: NetworkDocument
  /** Data sets of `data` blocks by file name, sent once each; the worker keeps them. */
  dataSets?: Record<string, DataSet>
  /** Documents of sub-networks by the reference blocks use; when given, they replace what the worker had. */
  networks?: Record<string, NetworkDocument>
}

/** The S-parameters as the worker sends them (arrays are transferred, not copied). */
export interface SolvedData {
  ports: number
  impedances: number[]
  frequencies: Float64Array
  re: Float64Array
  im: Float64Array
}

export interface SolveReply {
  seq: number
  evaluated: Evaluated | null
  problems: Problem[]
  result: SolvedData | null
  /** Time in the worker: evaluation, set-up and the sweep. */
  solveMs: number
}
