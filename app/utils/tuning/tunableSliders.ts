import { formatQuantity } from '~~/shared/network/format-quantity'
import type { Evaluated, NetworkDocument, ParamValue } from '~~/shared/network/types'
import { evaluateVariables } from '~~/shared/network/variables'
import { resolveTunableRanges } from '~~/shared/tuning/tunable-ranges'
import { resolveValueKeys, type ValueTarget } from '~~/shared/tuning/value-key'

/** One slider of the tune panel: a tunable's range and current value (SI), or why it cannot be shown. */
export interface TunableSlider {
  key: string
  target?: ValueTarget
  min?: number
  max?: number
  value?: number
  error?: string
}

/** Sliders for the document's tunables from the values the solver evaluated; a bad key or range says why. */
export function tunableSliders(document: NetworkDocument, evaluated: Evaluated | null): TunableSlider[] {
  const tunables = document.tunables ?? {}
  const keys = Object.keys(tunables)
  if (!keys.length || !evaluated) return keys.map(key => ({ key, error: evaluated ? undefined : 'waiting for the solver' }))
  const scope = evaluateVariables(document.variables).scope
  const resolved = resolveValueKeys(document, evaluated, scope, keys, 'tunables')
  const ranges = resolveTunableRanges(tunables, resolved.targets, scope)
  const problems = [...resolved.problems, ...(ranges.ok ? [] : ranges.problems)]
  return keys.map((key) => {
    const problem = problems.find(p => p.field === `tunables.${key}` || p.field?.startsWith(`tunables.${key}.`))
    if (problem) return { key, error: problem.message.replace(/^tunables\.[^:]*: /, '') }
    const range = ranges.ok ? ranges.ranges.find(r => r.target.key === key) : undefined
    if (!range) return { key, error: 'its range could not be read' }
    return { key, target: range.target, min: range.min, max: range.max, value: range.target.nominal }
  })
}

/** A tunable's value as written into the document: a number (SI) for a parameter, "value unit" for a variable with a unit. */
export function writtenValue(target: ValueTarget, value: number): ParamValue {
  if ('variableUnit' in target.unit && target.unit.variableUnit) return `${value} ${target.unit.variableUnit}`
  return value
}

/** A value for display with its unit and SI prefix. */
export function shownValue(target: ValueTarget, value: number): string {
  if ('kind' in target.unit) return formatQuantity(value, target.unit.kind)
  return `${Number(value.toPrecision(4))}${target.unit.variableUnit ? ` ${target.unit.variableUnit}` : ''}`
}
