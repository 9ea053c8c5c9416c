import { MU0 } from './constants'

/** Skin depth of a good conductor, m: δ = √(2/(ωµ0σ)) = 1/√(πfµ0σ). */
export function skinDepth(frequency: number, conductivity: number): number {
  return 1 / Math.sqrt(Math.PI * frequency * MU0 * conductivity)
}
