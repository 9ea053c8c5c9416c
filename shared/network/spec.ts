import type { SpecMask } from '../rf/spec-mask'
import { evaluateQuantity } from './expression'
import { formatQuantity } from './format-quantity'
import type { NetworkDocument, Problem } from './types'
import { evaluateVariables, type VariablesOutcome } from './variables'

/** A document's `spec` with its frequencies evaluated, or the problems that stop it being read. */
export type ResolvedSpec = { ok: true; spec: SpecMask } | { ok: false; problems: Problem[] }

/**
 * Evaluates the frequencies of a document's `spec` (contract 1.1) with the document's variables,
 * and checks that its ports exist when `ports` is given. Returns undefined when there is no spec.
 * The structure itself was checked by the schema.
 */
export function resolveSpec(document: NetworkDocument, options: { ports?: number; variables?: VariablesOutcome } = {}): ResolvedSpec | undefined {
  const written = document.spec
  if (written === undefined) return undefined
  const vars = options.variables ?? evaluateVariables(document.variables)
  const problems: Problem[] = []
  const frequency = (value: unknown, field: string): number | undefined => {
    if (typeof value !== 'number' && typeof value !== 'string') {
      problems.push({ field, message: `${field}: must be a frequency` })
      return undefined
    }
    const outcome = evaluateQuantity(value, 'frequency', vars.scope, vars.failed)
    if (!outcome.ok) problems.push({ field, message: `${field}: ${outcome.error}` })
    else if (!(outcome.value > 0)) problems.push({ field, message: `${field}: must be greater than zero (got ${formatQuantity(outcome.value, 'frequency')})` })
    else return outcome.value
    return undefined
  }
  const center = frequency(written.center, 'spec.center')
  const start = written.band ? frequency(written.band.start, 'spec.band.start') : undefined
  const stop = written.band ? frequency(written.band.stop, 'spec.band.stop') : undefined
  if (start !== undefined && stop !== undefined && !(stop > start)) {
    problems.push({ field: 'spec.band', message: `spec.band: the stop (${formatQuantity(stop, 'frequency')}) must be above the start (${formatQuantity(start, 'frequency')})` })
  }
  const conditions = Array.isArray(written.conditions) ? written.conditions : []
  if (options.ports !== undefined) {
    const n = options.ports
    conditions.forEach((condition, index) => {
      const used = 'port' in condition ? [condition.port] : [condition.from, ...(Array.isArray(condition.to) ? condition.to : [condition.to])]
      const missing = used.filter(p => p > n)
      if (missing.length) problems.push({ field: `spec.conditions[${index}]`, message: `spec.conditions[${index}]: port ${missing[0]} does not exist (the network has ${n} port${n === 1 ? '' : 's'})` })
    })
  }
  if (problems.length || center === undefined) return { ok: false, problems }
  const spec: SpecMask = { center, conditions: conditions.map(c => structuredClone(c)) }
  if (start !== undefined && stop !== undefined) spec.band = { start, stop }
  return { ok: true, spec }
}
