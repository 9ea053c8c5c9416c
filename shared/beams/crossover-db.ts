import { arrayFactorPower } from './array-factor-power'
import { bisectRoot } from './bisect-root'
import type { ArrayGeometry, ArrayWeights } from './types'

/** A beam as `crossoverDb` needs it: its weights and refined peak. */
export interface SteeredBeam {
  weights: ArrayWeights
  peakDeg: number
}

// Keeps the logarithm finite at a null.
const FLOOR = 1e-300

/**
 * Where two beams cross between their peaks, in dB relative to their own peaks (the level at which each
 * beam's normalised pattern equals the other's), found by bisection between the peaks.
 */
export function crossoverDb(a: SteeredBeam, b: SteeredBeam, geometry: ArrayGeometry): number {
  const [first, second] = a.peakDeg <= b.peakDeg ? [a, b] : [b, a]
  const relative = (beam: SteeredBeam) => {
    const peak = arrayFactorPower(beam.weights, geometry, beam.peakDeg)
    return (theta: number) => 10 * Math.log10(Math.max(arrayFactorPower(beam.weights, geometry, theta), FLOOR) / peak)
  }
  const levelFirst = relative(first), levelSecond = relative(second)
  if (first.peakDeg === second.peakDeg) return 0
  const theta = bisectRoot(t => levelFirst(t) - levelSecond(t), first.peakDeg, second.peakDeg)
  return levelFirst(theta)
}
