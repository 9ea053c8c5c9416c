import { ETA0 } from './constants'
import { roughnessFactor } from './roughness-factor'
import { skinDepth } from './skin-depth'
import { surfaceResistance } from './surface-resistance'

/** What the conductor-loss model needs: width (m), conductivity (S/m), roughness (m), static Z0 and air-line Z01 (Ω). */
export interface ConductorLossInput {
  width: number
  conductivity: number
  roughness: number
  impedance: number
  airImpedance: number
}

/**
 * Conductor attenuation of microstrip in Np/m, Hammerstad–Jensen formulation
 * (IEEE MTT-S Digest 1980): α_c = Rs/(Z0·W)·K_i·K_r, with the current-distribution factor
 * K_i = exp(−1.2·(Z01/η0)^0.7) and the roughness factor K_r of Hammerstad & Bekkadal (1975).
 * Assumes the strip and ground are several skin depths thick.
 */
export function conductorLoss(frequency: number, input: ConductorLossInput): number {
  if (frequency <= 0) return 0
  const rs = surfaceResistance(frequency, input.conductivity)
  const currentFactor = Math.exp(-1.2 * Math.pow(input.airImpedance / ETA0, 0.7))
  const rough = roughnessFactor(input.roughness, skinDepth(frequency, input.conductivity))
  return (rs / (input.impedance * input.width)) * currentFactor * rough
}
