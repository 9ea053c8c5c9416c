import type { SpecMask } from './spec-mask'

// Band ends computed from expressions may miss a sweep point by rounding; a few parts in 10¹² count as inside.
const EDGE = 1e-12

/**
 * The frequencies (Hz) at which a spec is judged: the sweep's frequencies inside `band`
 * (ends included), or `center` alone when the spec has no band. Empty when no sweep
 * frequency falls inside the band.
 */
export function specFrequencies(spec: SpecMask, sweep: ArrayLike<number>): Float64Array {
  if (!spec.band) return Float64Array.of(spec.center)
  const out: number[] = []
  for (let k = 0; k < sweep.length; k++) if (judgesFrequency(spec, sweep[k]!)) out.push(sweep[k]!)
  return Float64Array.from(out)
}

/** Whether a spec is judged at this frequency (Hz): inside its band, or its centre when it has none. */
export function judgesFrequency(spec: SpecMask, f: number): boolean {
  if (!spec.band) return Math.abs(f - spec.center) <= EDGE * spec.center
  return f >= spec.band.start * (1 - EDGE) && f <= spec.band.stop * (1 + EDGE)
}
