/** Messages between the editor and its solve worker. */
import type { Evaluated, NetworkDocument, Problem } from '../../shared/network/types'

export interface SolveRequest {
  seq: number
  document: NetworkDocument
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
