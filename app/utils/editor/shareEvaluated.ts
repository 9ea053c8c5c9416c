/**
 * Structural sharing between two evaluations of a document: the new one, with
 * every part that did not change replaced by the previous object. A slider
 * edit changes one value; fields and canvas labels that receive the same
 * object as before are not re-rendered.
 */
import type { Evaluated, EvaluatedValue } from '~~/shared/network/types'

function sameValue(a: EvaluatedValue, b: EvaluatedValue): boolean {
  return a.value === b.value && a.unit === b.unit && a.display === b.display && a.error === b.error
}

/** `next`, or `previous` when every entry is the same; entries that are the same keep their previous object. */
function shareRecord<T>(previous: Record<string, T> | undefined, next: Record<string, T>, share: (a: T, b: T) => T): Record<string, T> {
  if (!previous) return next
  const keys = Object.keys(next)
  let same = keys.length === Object.keys(previous).length
  const out: Record<string, T> = {}
  for (const key of keys) {
    const before = previous[key]
    const value = before === undefined ? next[key]! : share(before, next[key]!)
    if (value !== before) same = false
    out[key] = value
  }
  return same ? previous : out
}

const shareValue = (a: EvaluatedValue, b: EvaluatedValue) => (sameValue(a, b) ? a : b)
const shareValues = (a: Record<string, EvaluatedValue>, b: Record<string, EvaluatedValue>) => shareRecord(a, b, shareValue)

export function shareEvaluated(previous: Evaluated | null, next: Evaluated | null): Evaluated | null {
  if (!previous || !next) return next
  const variables = shareRecord(previous.variables, next.variables, shareValue)
  const blocks = shareRecord(previous.blocks, next.blocks, shareValues)
  const settings = shareRecord(previous.settings, next.settings, shareValue)
  if (variables === previous.variables && blocks === previous.blocks && settings === previous.settings) return previous
  return { ...next, variables, blocks, settings }
}
