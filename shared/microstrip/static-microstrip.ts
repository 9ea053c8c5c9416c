import { homogeneousImpedance } from './homogeneous-impedance'
import { staticEffectivePermittivity } from './static-effective-permittivity'
import { thicknessWidths } from './thickness-widths'

/** Quasi-static microstrip quantities: impedance (Ω), effective permittivity and the air-line impedance used by the loss model. */
export interface StaticMicrostrip {
  impedance: number
  epsEff: number
  /** Impedance of the same strip in air (Ω), Z01(u1). */
  airImpedance: number
}

/**
 * Quasi-static impedance and effective permittivity with the thickness correction of
 * Hammerstad & Jensen (IEEE MTT-S Digest 1980): Z0 = Z01(ur)/√ε_eff(ur, εr) and
 * ε_eff = ε_eff(ur, εr)·(Z01(u1)/Z01(ur))². u = W/h, t = T/h.
 */
export function staticMicrostrip(u: number, thicknessOverHeight: number, permittivity: number): StaticMicrostrip {
  const { u1, ur } = thicknessWidths(u, thicknessOverHeight, permittivity)
  const z1 = homogeneousImpedance(u1)
  const zr = homogeneousImpedance(ur)
  const epsR = staticEffectivePermittivity(ur, permittivity)
  return { impedance: zr / Math.sqrt(epsR), epsEff: epsR * (z1 / zr) ** 2, airImpedance: z1 }
}
