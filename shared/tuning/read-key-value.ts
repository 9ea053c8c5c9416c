import { evaluateQuantity, evaluateVariableValue, type Scope } from '../network/expression'
import { valueMath } from '../network/math-instance'
import type { ParamValue } from '../network/types'
import type { ValueTarget } from './value-key'

/**
 * Reads a value written for a key (a range end, an absolute tolerance) in the key's SI unit: a number is
 * taken as SI, an expression must have the key's dimension. May use the document's variables.
 */
export function readKeyValue(input: ParamValue, target: ValueTarget, scope: Scope, failed?: ReadonlySet<string>): { ok: true; value: number } | { ok: false; error: string } {
  if ('kind' in target.unit) return evaluateQuantity(input, target.unit.kind, scope, failed)
  const unit = target.unit.variableUnit
  const outcome = evaluateVariableValue(input, scope)
  if (!outcome.ok) return outcome
  const value = outcome.value
  if (typeof value === 'number') return { ok: true, value }
  if (unit === null) return { ok: false, error: `"${input}" has a unit, but ${target.key} is a plain number` }
  if (!value.equalBase(valueMath.unit(1, unit))) return { ok: false, error: `"${input}" is not in the unit of ${target.key} (${unit})` }
  const si = value.toNumber(unit)
  return Number.isFinite(si) ? { ok: true, value: si } : { ok: false, error: `"${input}" is not a finite number` }
}
