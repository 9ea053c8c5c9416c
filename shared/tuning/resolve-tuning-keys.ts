import type { Problem } from '../network/types'
import { resolveToleranceSpreads, type ToleranceSpread } from './tolerance-spreads'
import type { TuningSetup } from './tuning-setup'
import { resolveTunableRanges, type TunableRange } from './tunable-ranges'
import { resolveValueKeys } from './value-key'

/** The document's `tunables` with their ranges evaluated; problems name `tunables.KEY`. */
export function resolveTunables(setup: TuningSetup): { ok: true; ranges: TunableRange[] } | { ok: false; problems: Problem[] } {
  const tunables = setup.document.tunables ?? {}
  const keys = Object.keys(tunables)
  if (keys.length === 0) return { ok: false, problems: [{ field: 'tunables', message: 'tunables: the document has none; name what may change, e.g. "tunables": {"T1.impedance": {"min": "30 ohm", "max": "40 ohm"}}' }] }
  const resolved = resolveValueKeys(setup.document, setup.evaluated, setup.variables.scope, keys, 'tunables')
  const ranges = resolveTunableRanges(tunables, resolved.targets, setup.variables.scope)
  const problems = [...resolved.problems, ...(ranges.ok ? [] : ranges.problems)]
  return problems.length ? { ok: false, problems } : ranges
}

/** The document's `tolerances` with their spreads evaluated; problems name `tolerances.KEY`. */
export function resolveTolerances(setup: TuningSetup): { ok: true; spreads: ToleranceSpread[] } | { ok: false; problems: Problem[] } {
  const tolerances = setup.document.tolerances ?? {}
  const keys = Object.keys(tolerances)
  if (keys.length === 0) return { ok: false, problems: [{ field: 'tolerances', message: 'tolerances: the document has none; give the spread of a value, e.g. "tolerances": {"T1.impedance": {"relative": 0.02}}' }] }
  const resolved = resolveValueKeys(setup.document, setup.evaluated, setup.variables.scope, keys, 'tolerances')
  const spreads = resolveToleranceSpreads(tolerances, resolved.targets, setup.variables.scope)
  const problems = [...resolved.problems, ...(spreads.ok ? [] : spreads.problems)]
  return problems.length ? { ok: false, problems } : spreads
}
