import { describe, expect, it } from 'vitest'
import { coupledMicrostripStatic, ellipticRatio } from '../../../shared/microstrip/coupled-static'
import { staticMicrostrip } from '../../../shared/microstrip/static-microstrip'

// Garg & Bahl, "Characteristics of coupled microstriplines", IEEE Trans. MTT-27, 1979 [memory]; checks derived by hand.
describe('coupled microstrips, quasi-static (Garg & Bahl 1979)', () => {
  it('K(k\')/K(k) is 1 at k = 1/√2 and K(k\')/K(k)·K(k)/K(k\') = 1 (common practice: K(k) = K(k\') at k = k\')', () => {
    expect(ellipticRatio(Math.SQRT1_2)).toBeCloseTo(1, 14)
    expect(ellipticRatio(0.3) * ellipticRatio(Math.sqrt(1 - 0.09))).toBeCloseTo(1, 13)
    // K(0) = π/2 and K(k') → ln(4/k) as k → 0 (Abramowitz & Stegun 17.3.26): ratio ≈ 2·ln(4/k)/π.
    expect(ellipticRatio(1e-6) / ((2 * Math.log(4 / 1e-6)) / Math.PI)).toBeCloseTo(1, 9)
  })

  it('in air both modes have ε_eff = 1 exactly (derived by hand: C = C^air)', () => {
    const m = coupledMicrostripStatic(1, 0.3, 1)
    expect(m.evenEpsEff).toBe(1)
    expect(m.oddEpsEff).toBe(1)
  })

  it('in its range: Ze above and Zo below the single strip, √(Ze·Zo) within 5 % of it at s/h = 2 (nearly uncoupled; the fit\'s own error at the edge of its range), the even mode slower than the odd', () => {
    for (const er of [2.2, 3.5, 9.8]) {
      for (const u of [0.2, 0.5, 1, 2]) {
        const single = staticMicrostrip(u, 0, er)
        let previousRatio = Infinity
        for (const g of [0.05, 0.2, 0.5, 1, 2]) {
          const m = coupledMicrostripStatic(u, g, er)
          expect(m.evenImpedance).toBeGreaterThan(single.impedance)
          expect(m.oddImpedance).toBeLessThan(single.impedance)
          expect(m.evenEpsEff).toBeGreaterThan(m.oddEpsEff * (g < 1 ? 1 : 0.9))
          // Coupling weakens as the gap opens.
          expect(m.evenImpedance / m.oddImpedance).toBeLessThan(previousRatio)
          previousRatio = m.evenImpedance / m.oddImpedance
        }
        const wide = coupledMicrostripStatic(u, 2, er)
        expect(Math.abs(Math.sqrt(wide.evenImpedance * wide.oddImpedance) / single.impedance - 1), `εr ${er}, u ${u}`).toBeLessThan(0.05)
      }
    }
  })
})
