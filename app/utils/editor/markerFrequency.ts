/**
 * The marker readout's frequency field: what the user typed, read as a
 * frequency and snapped to the nearest sweep point, with the text the field
 * shows afterwards.
 */
import { evaluateQuantity } from '~~/shared/network/expression'
import { formatFrequency } from './format'
import { nearestIndex } from './traces'

export type MarkerFrequencyOutcome =
  | { ok: true, index: number, frequency: number, text: string }
  | { ok: false, error: string }

/** Read "2.45 GHz", "2450 MHz" or "2.45e9" as the sweep point nearest to it. */
export function readMarkerFrequency(text: string, frequencies: ArrayLike<number>): MarkerFrequencyOutcome {
  if (!frequencies.length) return { ok: false, error: 'there is no sweep to place the marker on' }
  if (!text.trim()) return { ok: false, error: 'type a frequency, such as 2.45 GHz' }
  const outcome = evaluateQuantity(text.trim(), 'frequency', new Map())
  if (!outcome.ok) return { ok: false, error: outcome.error }
  const index = nearestIndex(frequencies, outcome.value)
  const frequency = frequencies[index]!
  return { ok: true, index, frequency, text: formatFrequency(frequency) }
}
