/**
 * What `POST /api/v1/solve` does once the caller is allowed: prepare the document (subnetworks from the given
 * project's networks), apply the sweep override, refuse answers too large to send, solve, and write the
 * contract's JSON. Pure, so the server runs it in a solve worker and tests run it directly.
 */
import { evaluateQuantity } from '../network/expression'
import { DOCUMENT_LIMITS } from '../network/limits'
import { prepareNetwork, resolveSweep, solveNetwork, sweepFrequencies, type SweepSettings } from '../solver/index'
import { solveResultJsonText } from '../solver/solve-json'

/** A sweep override as a script sends it: frequencies in hertz or with units ("2.45 GHz"). */
export interface ApiSweepOverride {
  start?: number | string
  stop?: number | string
  points?: number
  spacing?: 'linear' | 'log'
}

/** One API solve: the document, the project's networks by id and by name, and an optional sweep override. */
export interface ApiSolveTask {
  document: unknown
  networks: Array<[string, unknown]>
  sweep?: ApiSweepOverride
}

export type ApiSolveOutcome = { ok: true; json: string } | { ok: false; problems: string[] }

/** Limits of one API answer: points as a document's own sweep, and S-parameter values (ports² × points). */
export const API_SOLVE_LIMITS = { points: DOCUMENT_LIMITS.sweepPoints, values: 500_000 } as const

function overrideOf(sweep: ApiSweepOverride | undefined): { ok: true; value: Partial<SweepSettings> } | { ok: false; problems: string[] } {
  const value: Partial<SweepSettings> = {}
  const problems: string[] = []
  for (const field of ['start', 'stop'] as const) {
    const given = sweep?.[field]
    if (given === undefined) continue
    const outcome = evaluateQuantity(given, 'frequency', new Map())
    if (outcome.ok) value[field] = outcome.value
    else problems.push(`sweep.${field}: ${outcome.error}`)
  }
  if (sweep?.points !== undefined) value.points = sweep.points
  if (sweep?.spacing !== undefined) value.spacing = sweep.spacing
  return problems.length ? { ok: false, problems } : { ok: true, value }
}

/** Solves one API request; problems are in plain words, naming the block, field or limit. */
export function solveForApi(task: ApiSolveTask): ApiSolveOutcome {
  const byRef = new Map(task.networks)
  const prepared = prepareNetwork(task.document, { resolveSubnetwork: ref => byRef.get(ref) })
  if (!prepared.ok) return { ok: false, problems: prepared.problems.map(p => p.message) }
  const override = overrideOf(task.sweep)
  if (!override.ok) return override
  const sweep = resolveSweep(prepared.network.sweep, override.value)
  if (!sweep.ok) return { ok: false, problems: sweep.problems.map(p => p.message) }
  const { points } = sweep.sweep
  if (points > API_SOLVE_LIMITS.points) {
    return { ok: false, problems: [`sweep.points: at most ${API_SOLVE_LIMITS.points.toLocaleString('en')} points per request (got ${points.toLocaleString('en')}); split the band into several requests`] }
  }
  const ports = prepared.network.ports
  if (ports * ports * points > API_SOLVE_LIMITS.values) {
    const most = Math.max(1, Math.floor(API_SOLVE_LIMITS.values / (ports * ports)))
    return { ok: false, problems: [`The answer would hold ${(ports * ports * points).toLocaleString('en')} S-parameter values (${ports} ports, ${points.toLocaleString('en')} points); at most ${API_SOLVE_LIMITS.values.toLocaleString('en')} per request: ask for ${most.toLocaleString('en')} points or fewer`] }
  }
  const solved = solveNetwork(prepared.network, sweepFrequencies(sweep.sweep))
  if (!solved.ok) return { ok: false, problems: solved.problems.map(p => p.message) }
  return { ok: true, json: solveResultJsonText(solved.result) }
}
