/**
 * The editor's line calculator: reads what was typed (numbers in SI, or expressions with units that may
 * use the document's variables), takes a substrate of the document and asks the same shared function
 * as the `line` command, so the two always agree.
 */
import { lineFigures, type LineFigures } from '~~/shared/microstrip/line-figures'
import { evaluateQuantity } from '~~/shared/network/expression'
import type { QuantityKind } from '~~/shared/network/quantities'
import { evaluateSubstrates } from '~~/shared/network/substrates'
import type { NetworkDocument } from '~~/shared/network/types'
import { evaluateVariables } from '~~/shared/network/variables'
import { readParamInput } from './paramInput'

/** What the calculator form holds, as typed. */
export interface LineCalculatorInputs {
  substrate: string
  mode: 'analyse' | 'synthesise'
  width: string
  impedance: string
  frequency: string
  degrees: string
}

/** The figures (when the inputs allow), the range warnings, and an error per field that is wrong. */
export interface LineCalculation {
  figures?: LineFigures
  warnings: string[]
  errors: Partial<Record<keyof LineCalculatorInputs, string>>
}

/** Computes a microstrip's figures from the calculator's inputs on one of the document's substrates. */
export function calculateLine(doc: NetworkDocument, inputs: LineCalculatorInputs): LineCalculation {
  const errors: LineCalculation['errors'] = {}
  const variables = evaluateVariables(doc.variables)
  const substrates = evaluateSubstrates(doc.substrates, variables.scope, variables.failed)
  const substrate = substrates.values.get(inputs.substrate)
  if (!substrate) {
    errors.substrate = inputs.substrate in (doc.substrates ?? {}) ? 'this substrate has errors: see its values above' : 'choose a substrate (add one above)'
  }
  const read = (field: 'width' | 'impedance' | 'frequency' | 'degrees', kind: QuantityKind, required: boolean, positive: boolean): number | undefined => {
    const value = readParamInput(inputs[field])
    if (value === undefined) {
      if (required) errors[field] = 'is required'
      return undefined
    }
    const outcome = evaluateQuantity(value, kind, variables.scope, variables.failed)
    if (!outcome.ok) errors[field] = outcome.error
    else if (positive ? !(outcome.value > 0) : outcome.value < 0) errors[field] = positive ? 'must be greater than zero' : 'must not be negative'
    else return outcome.value
    return undefined
  }
  const analyse = inputs.mode === 'analyse'
  const width = analyse ? read('width', 'length', true, true) : undefined
  const impedance = analyse ? undefined : read('impedance', 'impedance', true, true)
  const frequency = read('frequency', 'frequency', false, true)
  const degrees = read('degrees', 'angle', false, false)
  if (degrees !== undefined && frequency === undefined && !errors.frequency) errors.frequency = 'is needed for a length in degrees'
  if (!substrate || Object.keys(errors).length) return { warnings: [], errors }
  const question = analyse ? { width: width! } : { impedance: impedance! }
  const outcome = lineFigures(substrate, { ...question, ...(frequency !== undefined ? { frequency } : {}), ...(degrees !== undefined ? { degrees } : {}) })
  if (!outcome.ok) return { warnings: [], errors: { [outcome.field]: outcome.message } }
  return { figures: outcome.figures, warnings: outcome.notes.map(n => n.message), errors }
}
