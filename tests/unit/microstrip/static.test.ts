import { describe, expect, it } from 'vitest'
import { ETA0 } from '../../../shared/microstrip/constants'
import { homogeneousImpedance } from '../../../shared/microstrip/homogeneous-impedance'
import { staticEffectivePermittivity } from '../../../shared/microstrip/static-effective-permittivity'
import { staticMicrostrip } from '../../../shared/microstrip/static-microstrip'
import { thicknessWidths } from '../../../shared/microstrip/thickness-widths'

/**
 * Hammerstad's earlier closed forms (Hammerstad, "Equations for microstrip circuit design",
 * Proc. 5th European Microwave Conf., 1975 [memory]); Pozar, Microwave Engineering, 4th ed.,
 * eqs. 3.195–3.196 give the same forms without the 0.04(1 − u)² term [memory].
 */
function hammerstad1975(u: number, er: number): { epsEff: number; impedance: number } {
  const epsEff = (er + 1) / 2 + ((er - 1) / 2) * ((1 + 12 / u) ** -0.5 + (u < 1 ? 0.04 * (1 - u) ** 2 : 0))
  const impedance = u <= 1
    ? (60 / Math.sqrt(epsEff)) * Math.log(8 / u + u / 4)
    : (120 * Math.PI) / (Math.sqrt(epsEff) * (u + 1.393 + 0.667 * Math.log(u + 1.444)))
  return { epsEff, impedance }
}

describe('Hammerstad–Jensen static microstrip model', () => {
  it('agrees with the 1975 closed forms to within their stated accuracy of about 1 %', () => {
    // Source: Hammerstad & Jensen 1980 introduce their model as an improvement on the ~1 % forms of 1975 [memory].
    for (const er of [2.2, 3.5, 4.4, 9.8, 12.9]) {
      for (const u of [0.1, 0.2, 0.5, 1, 2, 5, 10, 20]) {
        const hj = staticMicrostrip(u, 0, er)
        const old = hammerstad1975(u, er)
        expect(Math.abs(hj.epsEff / old.epsEff - 1), `εr ${er}, u ${u}: ε_eff`).toBeLessThan(0.01)
        expect(Math.abs(hj.impedance / old.impedance - 1), `εr ${er}, u ${u}: Z0`).toBeLessThan(0.01)
      }
    }
  })

  it('gives Pozar Example 3.7: εr = 2.20, h = 0.127 cm, 50 Ω → W/h ≈ 3.081, ε_eff ≈ 1.87', () => {
    // Pozar, Microwave Engineering, 4th ed., Example 3.7 [memory]: W/d = 3.081, W = 0.391 cm, ε_e = 1.87.
    const at = (u: number) => staticMicrostrip(u, 0, 2.2)
    let lo = 1, hi = 10
    for (let i = 0; i < 100; i++) { const mid = (lo + hi) / 2; if (at(mid).impedance > 50) lo = mid; else hi = mid }
    expect(lo).toBeCloseTo(3.081, 1)
    expect(Math.abs(lo / 3.081 - 1)).toBeLessThan(0.005)
    expect(Math.abs(at(lo).epsEff / 1.87 - 1)).toBeLessThan(0.01)
  })

  it('is an air line when εr = 1 and tends to the parallel-plate line when wide', () => {
    // Identities of the model: ε_eff(u, 1) = 1 exactly; Z01 → η0·h/W as u → ∞ (parallel-plate limit, Pozar §3.? [common practice]).
    expect(staticEffectivePermittivity(0.3, 1)).toBe(1)
    expect(staticMicrostrip(0.3, 0, 1).impedance).toBeCloseTo(homogeneousImpedance(0.3), 12)
    // The fringing terms fade as the strip widens (derived by hand: F → 2π and ln(1 + 2π/u) ≈ 2π/u).
    const gaps = [1e4, 1e5, 1e6].map(u => Math.abs(homogeneousImpedance(u) * u / ETA0 - 1))
    expect(gaps[0]).toBeLessThan(1e-3)
    expect(gaps[1]).toBeLessThan(gaps[0]!)
    expect(gaps[2]).toBeLessThan(gaps[1]!)
    // Fully filled limit: ε_eff → εr as the strip widens (derived by hand from the formula: (1 + 10/u)^(−ab) → 1).
    expect(staticEffectivePermittivity(1e6, 9.8)).toBeCloseTo(9.8, 3)
  })

  it('thickness widens the strip: lower Z0 and lower ε_eff; zero thickness changes nothing', () => {
    // Hammerstad & Jensen 1980: Δu1 > Δur > 0 for t > 0 (field moves into the air beside the strip edges).
    expect(thicknessWidths(1, 0, 4.4)).toEqual({ u1: 1, ur: 1 })
    const { u1, ur } = thicknessWidths(1, 0.035, 4.4)
    expect(u1).toBeGreaterThan(ur)
    expect(ur).toBeGreaterThan(1)
    const thin = staticMicrostrip(1, 0, 4.4), thick = staticMicrostrip(1, 0.035, 4.4)
    expect(thick.impedance).toBeLessThan(thin.impedance)
    expect(thick.epsEff).toBeLessThan(thin.epsEff)
    // Consistency: Z0 = Z01(u1)/√ε_eff, whatever the thickness (derived by hand from the paper's two formulas).
    expect(thick.impedance).toBeCloseTo(homogeneousImpedance(u1) / Math.sqrt(thick.epsEff), 10)
  })
})
