import type { Scope } from '../network/expression'
import { formatQuantity } from '../network/format-quantity'
import type { Problem, TunableSpec } from '../network/types'
import { readKeyValue } from './read-key-value'
import type { ValueTarget } from './value-key'

/** A tunable with its range evaluated (SI). */
export interface TunableRange {
  target: ValueTarget
  min: number
  max: number
}

function shown(value: number, target: ValueTarget): string {
  return 'kind' in target.unit ? formatQuantity(value, target.unit.kind) : `${value}${target.unit.variableUnit ? ` ${target.unit.variableUnit}` : ''}`
}

/** Evaluates each tunable's `min` and `max` in its key's unit; problems name `tunables.KEY.min|max`. */
export function resolveTunableRanges(
  tunables: Record<string, TunableSpec>,
  targets: readonly ValueTarget[],
  scope: Scope,
): { ok: true; ranges: TunableRange[] } | { ok: false; problems: Problem[] } {
  const problems: Problem[] = []
  const ranges: TunableRange[] = []
  for (const target of targets) {
    const written = tunables[target.key]!
    const ends: Partial<Record<'min' | 'max', number>> = {}
    for (const end of ['min', 'max'] as const) {
      const outcome = readKeyValue(written[end], target, scope)
      if (outcome.ok) ends[end] = outcome.value
      else problems.push({ field: `tunables.${target.key}.${end}`, message: `tunables.${target.key}.${end}: ${outcome.error}` })
    }
    if (ends.min === undefined || ends.max === undefined) continue
    if (!(ends.max > ends.min)) {
      problems.push({ field: `tunables.${target.key}`, message: `tunables.${target.key}: max (${shown(ends.max, target)}) must be above min (${shown(ends.min, target)})` })
      continue
    }
    ranges.push({ target, min: ends.min, max: ends.max })
  }
  return problems.length ? { ok: false, problems } : { ok: true, ranges }
}
