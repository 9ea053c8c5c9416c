/**
 * Public entry of the Portwright solver: prepare a network document once, then solve it
 * at any frequencies. Pure TypeScript; runs in the browser, a worker, the server and tsx.
 */
import type { Evaluated, Problem } from '../network/types'
import { prepareNetwork, type PrepareOptions } from './prepare'
import { solveNetwork, type SolveResult } from './solve'
import { resolveSweep, sweepFrequencies, type SweepSettings } from './sweep'

export { prepareNetwork, type PrepareOptions, type PrepareResult, type PreparedNetwork, type SubnetworkResolver, type DataResolver } from './prepare'
export { solveNetwork, type SolveOptions, type SolveOutcome, type SolveResult } from './solve'
export { resolveSweep, sweepFrequencies, MAX_POINTS, type SweepSettings } from './sweep'
export { renormalize } from './renormalize'
export { JoinPlanCache } from './plan-cache'
export { BLOCK_MODELS, LATER_BLOCK_TYPES } from './blocks/registry'
export type { BlockModel, BlockInstance, DataSet } from './types'
export type { JoinOrder } from './join-order'
export type { Problem, Evaluated, EvaluatedValue, NetworkDocument } from '../network/types'

/** Options of `solveDocument`: those of `prepareNetwork` plus a sweep override. */
export interface SolveDocumentOptions extends PrepareOptions {
  sweep?: Partial<SweepSettings>
}

/** Outcome of `solveDocument`: the result or the problems, with evaluated values for display either way. */
export type SolveDocumentResult =
  | { ok: true; result: SolveResult; evaluated: Evaluated }
  | { ok: false; problems: Problem[]; evaluated: Evaluated }

/** Prepares, sweeps and solves a document in one call. */
export function solveDocument(input: unknown, options: SolveDocumentOptions = {}): SolveDocumentResult {
  const prepared = prepareNetwork(input, options)
  if (!prepared.ok) return prepared
  const sweep = resolveSweep(prepared.network.sweep, options.sweep)
  if (!sweep.ok) return { ok: false, problems: sweep.problems, evaluated: prepared.evaluated }
  const solved = solveNetwork(prepared.network, sweepFrequencies(sweep.sweep))
  if (!solved.ok) return { ok: false, problems: solved.problems, evaluated: prepared.evaluated }
  return { ok: true, result: solved.result, evaluated: prepared.evaluated }
}
export { EditSolver, type EditSolverOptions, type EditSolveMode } from './incremental'
