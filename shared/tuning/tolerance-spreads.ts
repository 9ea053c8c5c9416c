import type { Scope } from '../network/expression'
import type { Problem, ToleranceSpec } from '../network/types'
import { readKeyValue } from './read-key-value'
import type { ValueTarget } from './value-key'

/** A tolerance evaluated: the spread's half-width (SI) around the nominal value, and its shape. */
export interface ToleranceSpread {
  target: ValueTarget
  /** ± this much: the uniform range's half-width, or 3σ for `normal`. */
  halfWidth: number
  distribution: 'uniform' | 'normal'
}

/** Evaluates each tolerance (relative to |nominal| or absolute in the key's unit); problems name `tolerances.KEY`. */
export function resolveToleranceSpreads(
  tolerances: Record<string, ToleranceSpec>,
  targets: readonly ValueTarget[],
  scope: Scope,
): { ok: true; spreads: ToleranceSpread[] } | { ok: false; problems: Problem[] } {
  const problems: Problem[] = []
  const spreads: ToleranceSpread[] = []
  for (const target of targets) {
    const written = tolerances[target.key]!
    const distribution = written.distribution ?? 'uniform'
    if (written.relative !== undefined) {
      spreads.push({ target, halfWidth: written.relative * Math.abs(target.nominal), distribution })
      continue
    }
    const outcome = readKeyValue(written.absolute!, target, scope)
    if (!outcome.ok) problems.push({ field: `tolerances.${target.key}.absolute`, message: `tolerances.${target.key}.absolute: ${outcome.error}` })
    else if (!(outcome.value >= 0)) problems.push({ field: `tolerances.${target.key}.absolute`, message: `tolerances.${target.key}.absolute: must not be negative` })
    else spreads.push({ target, halfWidth: outcome.value, distribution })
  }
  return problems.length ? { ok: false, problems } : { ok: true, spreads }
}
