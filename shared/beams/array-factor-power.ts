import type { ArrayGeometry, ArrayWeights } from './types'

/**
 * |AF(θ)|²/N of a uniform linear array, AF(θ) = Σ a_n·e^{j·2π·n·d·sin θ} (n from 0, d in wavelengths,
 * θ in degrees from broadside), times the element power pattern cosⁿθ when one is given. Equals 1 at the
 * peak of a lossless network feeding N equal, steered elements (|a_n|² = 1/N).
 */
export function arrayFactorPower(weights: ArrayWeights, geometry: ArrayGeometry, thetaDeg: number): number {
  const n = weights.re.length
  const theta = (thetaDeg * Math.PI) / 180
  const step = 2 * Math.PI * geometry.spacing * Math.sin(theta)
  let re = 0, im = 0
  for (let k = 0; k < n; k++) {
    const c = Math.cos(k * step), s = Math.sin(k * step)
    re += weights.re[k]! * c - weights.im[k]! * s
    im += weights.re[k]! * s + weights.im[k]! * c
  }
  const element = geometry.elementExponent ? Math.max(Math.cos(theta), 0) ** geometry.elementExponent : 1
  return ((re * re + im * im) / n) * element
}
