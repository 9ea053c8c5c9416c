import { formatQuantity } from '../network/format-quantity'
import { resolveSpec } from '../network/spec'
import type { Evaluated, NetworkDocument, Problem } from '../network/types'
import { evaluateVariables, type VariablesOutcome } from '../network/variables'
import type { SpecMask } from '../rf/spec-mask'
import { specFrequencies } from '../rf/spec-frequencies'
import { specMeets, type SpecCheck } from '../rf/spec-meets'
import { JoinPlanCache } from '../solver/plan-cache'
import { prepareNetwork, type PrepareOptions, type PreparedNetwork } from '../solver/prepare'
import { solveNetwork, type SolveResult } from '../solver/solve'
import { resolveSweep, sweepFrequencies } from '../solver/sweep'

/** A document ready for tuning and tolerance runs: its nominal solve, its spec and where the spec is judged. */
export interface TuningSetup {
  document: NetworkDocument
  evaluated: Evaluated
  variables: VariablesOutcome
  nominal: PreparedNetwork
  spec: SpecMask
  /** The document's sweep (Hz); with no band in the spec, the centre is added to it. */
  sweep: Float64Array
  /** Where the spec is judged: the sweep inside the band, or the centre. */
  judged: Float64Array
  /** Prepare options for every variant, sharing one join-plan cache (variants keep the nominal's structure). */
  prepareOptions: PrepareOptions
}

/**
 * Prepares a document for tuning: it must be valid, have a spec with at least one condition, and (with a
 * band) a sweep with frequencies inside the band. Problems name the field, as the solver's do.
 */
export function prepareTuning(input: unknown, options: PrepareOptions = {}): { ok: true; setup: TuningSetup } | { ok: false; problems: Problem[] } {
  const prepareOptions: PrepareOptions = { ...options, plans: options.plans ?? new JoinPlanCache() }
  const prepared = prepareNetwork(input, prepareOptions)
  if (!prepared.ok) return prepared
  const document = prepared.network.document
  const variables = evaluateVariables(document.variables)
  const resolved = resolveSpec(document, { ports: prepared.network.ports, variables })
  if (resolved === undefined) return { ok: false, problems: [{ field: 'spec', message: 'spec: the document has no spec; add one (centre, band and conditions) to judge designs against' }] }
  if (!resolved.ok) return resolved
  const spec = resolved.spec
  if (spec.conditions.length === 0) return { ok: false, problems: [{ field: 'spec.conditions', message: 'spec.conditions: give at least one condition to meet' }] }
  let sweep: Float64Array
  if (prepared.network.sweep || spec.band) {
    const resolvedSweep = resolveSweep(prepared.network.sweep)
    if (!resolvedSweep.ok) return resolvedSweep
    sweep = sweepFrequencies(resolvedSweep.sweep)
  } else {
    sweep = Float64Array.of(spec.center)
  }
  // Without a band the spec is judged at the centre: make it one of the swept frequencies.
  if (!spec.band && !sweep.includes(spec.center)) sweep = Float64Array.from([...sweep, spec.center]).sort()
  const judged = specFrequencies(spec, sweep)
  if (judged.length === 0) {
    // Enough digits that a narrow band's ends read differently.
    const band = `${formatQuantity(spec.band!.start, 'frequency', 8)} – ${formatQuantity(spec.band!.stop, 'frequency', 8)}`
    return { ok: false, problems: [{ field: 'spec.band', message: `spec.band: no frequency of the sweep lies inside the band ${band}; add sweep points or widen the band` }] }
  }
  const setup: TuningSetup = { document, evaluated: prepared.evaluated, variables, nominal: prepared.network, spec, sweep, judged, prepareOptions }
  const check = judgeDesign(setup, document)
  if (!check.ok) return check
  return { ok: true, setup }
}

/** A design judged against the setup's spec, with its S-parameters at `frequencies` (default: the judged ones). */
export type JudgedDesign = { ok: true; check: SpecCheck; result: SolveResult } | { ok: false; problems: Problem[] }

/** Prepares and solves a variant of the setup's document and judges it against the spec. */
export function judgeDesign(setup: TuningSetup, document: NetworkDocument, frequencies: Float64Array = setup.judged): JudgedDesign {
  const prepared = prepareNetwork(document, setup.prepareOptions)
  if (!prepared.ok) return prepared
  const solved = solveNetwork(prepared.network, frequencies)
  if (!solved.ok) return solved
  return { ok: true, check: specMeets(solved.result, setup.spec), result: solved.result }
}
