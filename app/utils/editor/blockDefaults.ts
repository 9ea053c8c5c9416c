/**
 * Starting values of a new block that fit the network: the design frequency
 * `f0` and the system impedance `Z0` when the network defines them, otherwise
 * numbers (a line is a quarter wave at the sweep's middle). Hints name only
 * variables that exist.
 */
import type { NetworkDocument, ParamValue } from '~~/shared/network/types'
import { evaluateQuantity } from '~~/shared/network/expression'
import { evaluateVariables } from '~~/shared/network/variables'

/** Middle of the document's sweep in Hz, or undefined when it cannot be evaluated. */
function sweepMiddle(doc: NetworkDocument): number | undefined {
  if (!doc.sweep) return undefined
  const vars = evaluateVariables(doc.variables)
  const a = evaluateQuantity(doc.sweep.start, 'frequency', vars.scope, vars.failed)
  const b = evaluateQuantity(doc.sweep.stop, 'frequency', vars.scope, vars.failed)
  return a.ok && b.ok && b.value >= a.value ? Number(((a.value + b.value) / 2).toPrecision(6)) : undefined
}

/** Rewrites a block's starting parameters in place for this document. */
export function fitDefaults(params: Record<string, ParamValue>, doc: NetworkDocument): void {
  const vars = doc.variables ?? {}
  if ('at' in params) params.at = 'f0' in vars ? 'f0' : sweepMiddle(doc) ?? 1e9
  if ('impedance' in params && typeof params.impedance === 'number' && 'Z0' in vars) params.impedance = 'Z0'
}

/** An example expression for help texts, built from names the document has. */
export function exampleExpression(doc: NetworkDocument): string {
  const vars = Object.keys(doc.variables ?? {})
  if (vars.includes('Z0')) return 'Z0/sqrt(2)'
  if (vars.length) return `${vars[0]} * 2`
  return '50 ohm / sqrt(2)'
}
