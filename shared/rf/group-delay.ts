import { phaseDeg } from './phase-deg'
import type { ComplexSeries } from './types'
import { unwrapPhaseDeg } from './unwrap-phase-deg'

/**
 * Group delay τ = −dφ/dω in seconds, from the unwrapped phase: central differences inside
 * the sweep, one-sided at its ends. Needs at least two frequencies; with one it is NaN.
 */
export function groupDelay(data: ComplexSeries, frequencies: Float64Array): Float64Array {
  const phase = unwrapPhaseDeg(phaseDeg(data))
  const points = frequencies.length
  const out = new Float64Array(points)
  if (points < 2) return out.fill(Number.NaN)
  const toRadPerRadPerSecond = Math.PI / 180 / (2 * Math.PI)
  for (let k = 0; k < points; k++) {
    const lo = k === 0 ? 0 : k - 1
    const hi = k === points - 1 ? points - 1 : k + 1
    out[k] = (-(phase[hi]! - phase[lo]!) * toRadPerRadPerSecond) / (frequencies[hi]! - frequencies[lo]!)
  }
  return out
}
