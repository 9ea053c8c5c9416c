import { ETA0 } from './constants'

/**
 * Characteristic impedance (Ω) of a zero-thickness microstrip in air, u = W/h
 * (Hammerstad & Jensen, "Accurate models for microstrip computer-aided design",
 * IEEE MTT-S Int. Microwave Symp. Digest 1980, pp. 407–409):
 * Z01 = η0/(2π)·ln(F/u + √(1 + 4/u²)), F = 6 + (2π − 6)·exp(−(30.666/u)^0.7528).
 * Stated accuracy 0.01 % for u ≤ 1 and 0.03 % for u ≤ 1000.
 */
export function homogeneousImpedance(u: number): number {
  const f = 6 + (2 * Math.PI - 6) * Math.exp(-Math.pow(30.666 / u, 0.7528))
  return (ETA0 / (2 * Math.PI)) * Math.log(f / u + Math.sqrt(1 + 4 / (u * u)))
}
