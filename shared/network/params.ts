import { evaluateQuantity, type Scope } from './expression'
import { formatQuantity } from './format-quantity'
import { QUANTITIES, type QuantityKind } from './quantities'
import type { EvaluatedValue, ParamValue, Problem } from './types'

/** A numeric parameter: its kind, default and the range it must lie in. */
export interface QuantityParamSpec {
  kind: QuantityKind
  /** Missing and no default: an error. */
  required?: boolean
  /** Value used when the parameter is absent; 'referenceImpedance' takes the document's. */
  default?: number | 'referenceImpedance'
  /** Inclusive lower bound. */
  min?: number
  /** Exclusive lower bound (e.g. impedances must be > 0). */
  above?: number
  /** Inclusive upper bound. */
  max?: number
  integer?: boolean
}

/** A parameter chosen from fixed words, such as `end: open | short`. */
export interface ChoiceParamSpec {
  kind: 'choice'
  choices: readonly string[]
  default?: string
  required?: boolean
}

/** A free text parameter, such as the reference of a subnetwork. */
export interface TextParamSpec {
  kind: 'text'
  required?: boolean
}

/** What a block type accepts for one parameter. */
export type ParamSpec = QuantityParamSpec | ChoiceParamSpec | TextParamSpec

/** Evaluated parameters of one block: numbers in SI, words as written; absent when not given and no default. */
export type ParamValues = Record<string, number | string | undefined>

/** What evaluation needs besides the parameters themselves. */
export interface ParamContext {
  scope: Scope
  failed: ReadonlySet<string>
  referenceImpedance: number
}

/** Evaluated block parameters, their display form and the problems found. */
export interface ParamsOutcome {
  values: ParamValues
  evaluated: Record<string, EvaluatedValue>
  problems: Problem[]
}

function rangeError(value: number, spec: QuantityParamSpec): string | undefined {
  const shown = formatQuantity(value, spec.kind)
  if (spec.integer && !Number.isInteger(value)) return `must be a whole number (got ${shown})`
  if (spec.above !== undefined && !(value > spec.above)) {
    return spec.above === 0 ? `must be greater than zero (got ${shown})` : `must be greater than ${formatQuantity(spec.above, spec.kind)} (got ${shown})`
  }
  if (spec.min !== undefined && value < spec.min) {
    return spec.min === 0 ? `must not be negative (got ${shown})` : `must be at least ${formatQuantity(spec.min, spec.kind)} (got ${shown})`
  }
  if (spec.max !== undefined && value > spec.max) return `must be at most ${formatQuantity(spec.max, spec.kind)} (got ${shown})`
  return undefined
}

/**
 * Evaluates one block's parameters against its type's specs. Every problem names
 * the block, the parameter and the reason; unknown parameter names are problems too.
 */
export function evaluateParams(
  blockId: string,
  type: string,
  params: Record<string, ParamValue>,
  specs: Record<string, ParamSpec>,
  context: ParamContext,
): ParamsOutcome {
  const values: ParamValues = {}
  const evaluated: Record<string, EvaluatedValue> = {}
  const problems: Problem[] = []
  const fail = (field: string, error: string) => {
    evaluated[field] = { ...evaluated[field], error }
    problems.push({ block: blockId, field, message: `block ${blockId} (${type}), ${field}: ${error}` })
  }
  for (const field of Object.keys(params)) {
    if (!(field in specs)) {
      const known = Object.keys(specs)
      fail(field, `is not a parameter of ${type}${known.length ? ` (it takes ${known.join(', ')})` : ''}`)
    }
  }
  for (const [field, spec] of Object.entries(specs)) {
    const input = params[field]
    if (spec.kind === 'choice' || spec.kind === 'text') {
      const text = input ?? (spec.kind === 'choice' ? spec.default : undefined)
      if (text === undefined) {
        if (spec.required) fail(field, 'is required')
        continue
      }
      if (typeof text !== 'string') {
        fail(field, spec.kind === 'choice' ? `must be one of ${spec.choices.join(', ')}` : 'must be text')
        continue
      }
      if (spec.kind === 'choice' && !spec.choices.includes(text)) {
        fail(field, `"${text}" is not one of ${spec.choices.join(', ')}`)
        continue
      }
      values[field] = text
      evaluated[field] = { display: text }
      continue
    }
    if (input === undefined) {
      const fallback = spec.default === 'referenceImpedance' ? context.referenceImpedance : spec.default
      if (fallback === undefined) {
        if (spec.required) fail(field, 'is required')
        continue
      }
      values[field] = fallback
      evaluated[field] = { value: fallback, unit: unitOf(spec.kind), display: formatQuantity(fallback, spec.kind) }
      continue
    }
    const outcome = evaluateQuantity(input, spec.kind, context.scope, context.failed)
    if (!outcome.ok) {
      fail(field, outcome.error)
      continue
    }
    evaluated[field] = { value: outcome.value, unit: unitOf(spec.kind), display: formatQuantity(outcome.value, spec.kind) }
    const error = rangeError(outcome.value, spec)
    if (error) {
      fail(field, error)
      continue
    }
    values[field] = outcome.value
  }
  return { values, evaluated, problems }
}

function unitOf(kind: QuantityKind): string {
  return QUANTITIES[kind].symbol
}
