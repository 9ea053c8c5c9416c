import type { Unit } from 'mathjs'
import { BLOCK_MODELS } from '../solver/blocks/registry'
import { valueMath } from '../network/math-instance'
import type { QuantityKind } from '../network/quantities'
import type { Evaluated, NetworkDocument, Problem } from '../network/types'
import type { Scope } from '../network/expression'

/**
 * A value the tuning tools may change, named by a KEY (contract 1.1): `BLOCK.param` or a variable name.
 * Values of a key are SI numbers (degrees for angles); `unit` says how written values are read and how
 * a new value is written back.
 */
export interface ValueTarget {
  key: string
  where: { block: number; param: string } | { variable: string }
  /** A block parameter's quantity kind, or the unit a variable is written in (null: a plain number). */
  unit: { kind: QuantityKind } | { variableUnit: string | null }
  /** The document's own value, in SI. */
  nominal: number
}

// Units variables are usually written in, with the SI value the inspector shows (degrees for angles).
const VARIABLE_UNITS = ['Hz', 'ohm', 'm', 'F', 'H', 'deg'] as const

/** The unit a variable's value is kept in: a common one of the same dimension, else its SI units. */
export function variableUnitOf(value: number | Unit): string | null {
  if (typeof value === 'number') return null
  for (const unit of VARIABLE_UNITS) if (value.equalBase(valueMath.unit(1, unit))) return unit
  return value.toSI().formatUnits()
}

/**
 * Finds what each KEY names in a prepared document and its current value. Every problem names the
 * field (`tunables.KEY`, `tolerances.KEY`) and what is wrong with the key; the keys that resolve are
 * returned either way, so their values can be checked in the same pass.
 */
export function resolveValueKeys(
  document: NetworkDocument,
  evaluated: Evaluated,
  scope: Scope,
  keys: readonly string[],
  field: string,
): { targets: ValueTarget[]; problems: Problem[] } {
  const problems: Problem[] = []
  const targets: ValueTarget[] = []
  const fail = (key: string, message: string) => problems.push({ field: `${field}.${key}`, message: `${field}.${key}: ${message}` })
  for (const key of keys) {
    const dot = key.indexOf('.')
    if (dot < 0) {
      if (!document.variables || !(key in document.variables)) {
        fail(key, `no variable is called "${key}" (a key is a variable name or BLOCK.param, e.g. T1.impedance)`)
        continue
      }
      const value = scope.get(key)
      const shown = evaluated.variables[key]?.value
      if (value === undefined || shown === undefined) {
        fail(key, `the variable ${key} has an error; correct it first`)
        continue
      }
      targets.push({ key, where: { variable: key }, unit: { variableUnit: variableUnitOf(value) }, nominal: shown })
      continue
    }
    const blockId = key.slice(0, dot)
    const param = key.slice(dot + 1)
    const index = document.blocks.findIndex(b => b.id === blockId)
    const block = document.blocks[index]
    if (!block) {
      fail(key, `no block is called "${blockId}"`)
      continue
    }
    const spec = BLOCK_MODELS[block.type]?.params[param]
    if (!spec) {
      const known = Object.keys(BLOCK_MODELS[block.type]?.params ?? {})
      fail(key, `block ${blockId} (${block.type}) has no parameter "${param}"${known.length ? ` (it takes ${known.join(', ')})` : ''}`)
      continue
    }
    if (spec.kind === 'choice' || spec.kind === 'text' || spec.kind === 'count') {
      fail(key, `${param} of block ${blockId} is not a value that can be varied`)
      continue
    }
    const nominal = evaluated.blocks[blockId]?.[param]?.value
    if (nominal === undefined) {
      fail(key, `${param} of block ${blockId} has no value to vary; give it one first`)
      continue
    }
    targets.push({ key, where: { block: index, param }, unit: { kind: spec.kind }, nominal })
  }
  return { targets, problems }
}
