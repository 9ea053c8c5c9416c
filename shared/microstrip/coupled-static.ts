import { C0 } from './constants'
import { staticMicrostrip } from './static-microstrip'

/** Even and odd modes of a pair of coupled microstrips: impedances (Ω) and effective permittivities. */
export interface CoupledModes {
  evenImpedance: number
  oddImpedance: number
  evenEpsEff: number
  oddEpsEff: number
}

const EPS0 = 1 / (4e-7 * Math.PI * C0 * C0)

/** K(k')/K(k) of the complete elliptic integral, exactly, by the arithmetic–geometric mean: K(k) = π/(2·AGM(1, k')). */
export function ellipticRatio(k: number): number {
  const agm = (a: number, b: number) => {
    for (let i = 0; i < 60 && Math.abs(a - b) > 1e-15 * a; i++) [a, b] = [(a + b) / 2, Math.sqrt(a * b)]
    return a
  }
  const kp = Math.sqrt(1 - k * k)
  // K(k')/K(k) = AGM(1, k')/AGM(1, k).
  return agm(1, kp) / agm(1, k)
}

/** Even- and odd-mode capacitances per length (F/m) of a symmetric pair, u = W/h, g = s/h, on εr. */
function capacitances(u: number, g: number, er: number): { even: number, odd: number } {
  const single = staticMicrostrip(u, 0, er)
  const cp = EPS0 * er * u
  const cf = (Math.sqrt(single.epsEff) / (C0 * single.impedance) - cp) / 2
  const a = Math.exp(-0.1 * Math.exp(2.33 - 2.53 * u))
  const cfPrime = cf / (1 + (a / g) * Math.tanh(8 * g))
  const k = g / (g + 2 * u)
  const cga = EPS0 * ellipticRatio(k)
  const cgd = ((EPS0 * er) / Math.PI) * Math.log(1 / Math.tanh((Math.PI * g) / 4)) + 0.65 * cf * ((0.02 / g) * Math.sqrt(er) + 1 - 1 / (er * er))
  return { even: cp + cf + cfPrime, odd: cp + cf + cga + cgd }
}

/**
 * Quasi-static even and odd modes of two coupled microstrips of width W, gap s on height h (zero
 * thickness): the capacitance model of Garg & Bahl, "Characteristics of coupled microstriplines",
 * IEEE Trans. MTT-27(7), 1979, pp. 700–705 [memory], as given in Gupta, Garg, Bahl & Bhartia,
 * "Microstrip Lines and Slotlines", 2nd ed., 1996, ch. 8 [memory]. With u = W/h, g = s/h:
 *   C_e = C_p + C_f + C_f',  C_o = C_p + C_f + C_ga + C_gd,  C_p = ε0·εr·u,
 *   C_f = (√ε_eff/(c·Z0) − C_p)/2 (of the single strip, Hammerstad–Jensen here),
 *   C_f' = C_f/(1 + (A/g)·tanh(8g)),  A = exp(−0.1·exp(2.33 − 2.53u)),
 *   C_ga = ε0·K(k')/K(k),  k = g/(g + 2u),
 *   C_gd = (ε0εr/π)·ln coth(πg/4) + 0.65·C_f·(0.02·√εr/g + 1 − εr⁻²);
 * Z_i = 1/(c·√(C_i·C_i^air)), ε_eff,i = C_i/C_i^air, with C^air the same at εr = 1. Stated accuracy
 * about 3 % for 0.2 ≤ u ≤ 2, 0.05 ≤ g ≤ 2, εr ≥ 1 [memory]. No dispersion.
 */
export function coupledMicrostripStatic(u: number, g: number, permittivity: number): CoupledModes {
  const dielectric = capacitances(u, g, permittivity)
  const air = capacitances(u, g, 1)
  return {
    evenImpedance: 1 / (C0 * Math.sqrt(dielectric.even * air.even)),
    oddImpedance: 1 / (C0 * Math.sqrt(dielectric.odd * air.odd)),
    evenEpsEff: dielectric.even / air.even,
    oddEpsEff: dielectric.odd / air.odd,
  }
}
