import { C0, ETA0, MU0 } from './constants'

/** One arm of a tee at one frequency: its characteristic impedance (Ω) and effective permittivity. */
export interface TeeArm {
  impedance: number
  epsEff: number
}

/** The elements of a symmetric microstrip tee at one frequency (Hammerstad's equivalent circuit). */
export interface TeeJunction {
  /** d1 (m): the main arms' reference planes lie this far from the branch's centre line. */
  mainShift: number
  /** d2 (m): the branch arm's reference plane lies this far from the main line's centre line. */
  branchShift: number
  /** n², the squared turns ratio of the ideal transformer in the branch arm. */
  turnsSquared: number
  /** B_T (S), the shunt susceptance at the junction node. */
  susceptance: number
  /** f_p1 (Hz) = Z1/(2µ0h), cut-off of the first higher mode of the main arm's parallel-plate model. */
  cutoff: number
}

/**
 * Symmetric microstrip tee, main line of impedance Z1 (both sides), branch of impedance Z2, on height h (m)
 * and permittivity εr at frequency f (Hz): the closed forms of E. Hammerstad, "Computer-aided design of
 * microstrip couplers with accurate discontinuity models", IEEE MTT-S Int. Microwave Symp. Digest 1981,
 * as given in Gupta, Garg, Bahl & Bhartia, "Microstrip Lines and Slotlines", 2nd ed., 1996, ch. 3
 * (T-junction) [memory: the equations below are written as we recall them]. With the parallel-plate widths
 * D_i = η0·h/(Z_i·√ε_eff,i), r = Z1/Z2 and x = (f/f_p1)²:
 *   d1 = 0.055·D2·r·(1 − 2r·x)
 *   d2 = D1·(0.5 − r·(0.05 + 0.7·e^(−1.6r) + 0.25·r·x − 0.17·ln r))
 *   n² = 1 − π·x·(r²/12 + (0.5 − d2/D1)²)
 *   B_T/Y1 = 5.5·((εr + 2)/εr)·(D1/λ1)·(d1/D2)·(1/n²)·(1 + 0.9·ln r + 4.5·r·x − 4.4·e^(−1.3r) − 20·(Z2/η0)²)
 * with λ1 = c/(f·√ε_eff,1) the main arm's guided wavelength. The model holds well below f_p1 (n² near 1).
 */
export function teeJunction(main: TeeArm, branch: TeeArm, height: number, permittivity: number, frequency: number): TeeJunction {
  const z1 = main.impedance, z2 = branch.impedance
  const d1Width = (ETA0 * height) / (z1 * Math.sqrt(main.epsEff))
  const d2Width = (ETA0 * height) / (z2 * Math.sqrt(branch.epsEff))
  const cutoff = z1 / (2 * MU0 * height)
  const r = z1 / z2
  const x = (frequency / cutoff) ** 2
  const mainShift = 0.055 * d2Width * r * (1 - 2 * r * x)
  const branchShift = d1Width * (0.5 - r * (0.05 + 0.7 * Math.exp(-1.6 * r) + 0.25 * r * x - 0.17 * Math.log(r)))
  const turnsSquared = 1 - Math.PI * x * (r * r / 12 + (0.5 - branchShift / d1Width) ** 2)
  const wavelength = C0 / (frequency * Math.sqrt(main.epsEff))
  const bracket = 1 + 0.9 * Math.log(r) + 4.5 * r * x - 4.4 * Math.exp(-1.3 * r) - 20 * (z2 / ETA0) ** 2
  const normalised = frequency > 0
    ? 5.5 * ((permittivity + 2) / permittivity) * (d1Width / wavelength) * (mainShift / d2Width) * bracket / turnsSquared
    : 0
  return { mainShift, branchShift, turnsSquared, susceptance: normalised / z1, cutoff }
}
