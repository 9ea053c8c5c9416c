import type { MicrostripSubstrate } from '../microstrip/types'
import { evaluateQuantity, type Scope } from './expression'
import { formatQuantity } from './format-quantity'
import { QUANTITIES, type QuantityKind } from './quantities'
import type { EvaluatedValue, Problem, Substrate } from './types'

/** Evaluated substrates by name, what the settings panel shows, and which ones have errors. */
export interface SubstratesOutcome {
  values: Map<string, MicrostripSubstrate>
  failed: Set<string>
  /** Keyed `substrates.NAME.KEY`, like the other document settings. */
  evaluated: Record<string, EvaluatedValue>
  problems: Problem[]
}

interface KeySpec {
  kind: QuantityKind
  required?: boolean
  default?: number
  /** Inclusive lower bound. */
  min?: number
  /** Exclusive lower bound. */
  above?: number
}

/** The substrate keys of the contract, plus `roughness` (RMS, metres), our extension. */
export const SUBSTRATE_KEYS: Readonly<Record<keyof MicrostripSubstrate, KeySpec>> = {
  permittivity: { kind: 'ratio', required: true, min: 1 },
  height: { kind: 'length', required: true, above: 0 },
  thickness: { kind: 'length', default: 0, min: 0 },
  lossTangent: { kind: 'ratio', default: 0, min: 0 },
  conductivity: { kind: 'conductivity', above: 0 },
  roughness: { kind: 'length', default: 0, min: 0 },
}

function rangeError(value: number, spec: KeySpec): string | undefined {
  const shown = formatQuantity(value, spec.kind)
  if (spec.above !== undefined && !(value > spec.above)) return `must be greater than ${formatQuantity(spec.above, spec.kind)} (got ${shown})`
  if (spec.min !== undefined && value < spec.min) return `must be at least ${formatQuantity(spec.min, spec.kind)} (got ${shown})`
  return undefined
}

/**
 * Evaluates the document's substrates (values may use variables). Each problem names the
 * substrate, the key and the reason; a substrate with any problem is listed in `failed`.
 */
export function evaluateSubstrates(substrates: Record<string, Substrate> | undefined, scope: Scope, failedVariables: ReadonlySet<string>): SubstratesOutcome {
  const outcome: SubstratesOutcome = { values: new Map(), failed: new Set(), evaluated: {}, problems: [] }
  for (const [name, substrate] of Object.entries(substrates ?? {})) {
    const values: Partial<MicrostripSubstrate> = {}
    for (const [key, spec] of Object.entries(SUBSTRATE_KEYS) as Array<[keyof MicrostripSubstrate, KeySpec]>) {
      const field = `substrates.${name}.${key}`
      const fail = (error: string) => {
        outcome.failed.add(name)
        outcome.evaluated[field] = { error }
        outcome.problems.push({ field, message: `substrate ${name}, ${key}: ${error}` })
      }
      const input = substrate[key]
      if (input === undefined) {
        if (spec.required) fail('is required')
        else if (spec.default !== undefined) values[key] = spec.default
        continue
      }
      if (typeof input !== 'number' && typeof input !== 'string') {
        fail('must be a number or an expression string')
        continue
      }
      const result = evaluateQuantity(input, spec.kind, scope, failedVariables)
      if (!result.ok) {
        fail(result.error)
        continue
      }
      const error = rangeError(result.value, spec)
      if (error) {
        fail(error)
        continue
      }
      values[key] = result.value
      outcome.evaluated[field] = { value: result.value, unit: QUANTITIES[spec.kind].symbol, display: formatQuantity(result.value, spec.kind) }
    }
    if (!outcome.failed.has(name)) outcome.values.set(name, values as MicrostripSubstrate)
  }
  return outcome
}
