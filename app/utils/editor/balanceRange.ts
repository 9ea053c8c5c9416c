/**
 * Axes of the Balance view: each spans the data and its target line, so
 * nothing is drawn beyond an edge, with a minimum span (±0.5 dB, ±5°) so a
 * near-perfect split is not blown up into noise.
 */
import type { AxisRange } from './plotRange'

/** Smallest half-span of the amplitude-difference axis (dB). */
export const BALANCE_DB_HALF_SPAN = 0.5
/** Smallest half-span of the phase-difference axis (degrees). */
export const BALANCE_DEG_HALF_SPAN = 5

/** The axis of one Balance trace: its values and target, padded 8 %, at least `minHalfSpan` either side of its middle. */
export function balanceAxisRange(values: ArrayLike<number>, target: number, minHalfSpan: number): AxisRange {
  let lo = Number.isFinite(target) ? target : Number.POSITIVE_INFINITY
  let hi = Number.isFinite(target) ? target : Number.NEGATIVE_INFINITY
  for (let k = 0; k < values.length; k++) {
    const v = values[k]!
    if (!Number.isFinite(v)) continue
    if (v < lo) lo = v
    if (v > hi) hi = v
  }
  if (!(lo <= hi)) return { min: -minHalfSpan, max: minHalfSpan }
  const pad = (hi - lo) * 0.08
  let min = lo - pad
  let max = hi + pad
  if (max - min < 2 * minHalfSpan) {
    const mid = (max + min) / 2
    min = mid - minHalfSpan
    max = mid + minHalfSpan
  }
  return { min, max }
}
