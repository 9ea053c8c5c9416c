import { C0 } from './constants'

/**
 * Dielectric attenuation of microstrip in Np/m (Pozar, Microwave Engineering, 4th ed., eq. 3.198 [memory]):
 * α_d = k0·εr·(ε_eff − 1)·tan δ/(2·√ε_eff·(εr − 1)). The filling factor (ε_eff − 1)/(εr − 1) tends to 1
 * for a fully filled line, giving the TEM value k·tan δ/2. For εr = 1 the line is in air and has no dielectric loss.
 */
export function dielectricLoss(frequency: number, permittivity: number, epsEff: number, lossTangent: number): number {
  if (lossTangent <= 0 || permittivity <= 1) return 0
  const k0 = (2 * Math.PI * frequency) / C0
  return (k0 * permittivity * (epsEff - 1) * lossTangent) / (2 * Math.sqrt(epsEff) * (permittivity - 1))
}
