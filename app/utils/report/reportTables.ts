/** Rows of the report's tables: blocks with their parameters, variables, and the spec in words. */
import type { Evaluated, NetworkDocument, SpecConditionSpec } from '~~/shared/network/types'
import { describeCondition, type SpecCondition } from '~~/shared/rf/spec-mask'

/** A block's parameters as written, each with its evaluated value where that differs ("Z0 = 50/sqrt(2) → 35.36 Ω"). */
export interface BlockRow { id: string, type: string, params: string[] }
/** A variable as written and as evaluated (or why it does not evaluate). */
export interface VariableRow { name: string, written: string, value: string }

/** One row per block, parameters in the document's order. */
export function blockRows(doc: NetworkDocument, evaluated?: Evaluated | null): BlockRow[] {
  return doc.blocks.map((b) => {
    const values = evaluated?.blocks[b.id] ?? {}
    const params = Object.entries(b.params ?? {}).map(([key, written]) => {
      const shown = values[key]?.display
      if (typeof written === 'number') return `${key} = ${shown ?? written}`
      return shown && shown !== written ? `${key} = ${written} → ${shown}` : `${key} = ${written}`
    })
    return { id: b.id, type: b.type, params }
  })
}

/** One row per variable. */
export function variableRows(doc: NetworkDocument, evaluated?: Evaluated | null): VariableRow[] {
  return Object.entries(doc.variables ?? {}).map(([name, written]) => {
    const v = evaluated?.variables[name]
    return { name, written: String(written), value: v?.error ? `does not evaluate: ${v.error}` : v?.display ?? '' }
  })
}

/** The spec's conditions in words, or an empty list without a spec. */
export function specConditionLines(doc: NetworkDocument): string[] {
  const conditions: SpecConditionSpec[] = Array.isArray(doc.spec?.conditions) ? doc.spec!.conditions : []
  return conditions.map(c => describeCondition(c as SpecCondition))
}
