import { describe, expect, it } from 'vitest'
import { abcdToS } from '../../../shared/solver/math/abcd-to-s'
import { doc, port, s, solveAt } from './helpers'

const F0 = 2.45e9

describe('ABCD to S', () => {
  it('gives the table values for a series 50 Ω impedance in a 50 Ω system', () => {
    // Pozar, Microwave Engineering, 4th ed., Table 4.2 (ABCD → S); check values derived from it by hand.
    const out = abcdToS(Float64Array.of(1, 0, 50, 0, 0, 0, 1, 0), 50, 50)
    expect(out[0]).toBeCloseTo(1 / 3, 12) // S11 = 1/3
    expect(out[4]).toBeCloseTo(2 / 3, 12) // S21 = 2/3
    expect(out[2]).toBeCloseTo(2 / 3, 12) // S12 = 2(AD − BC)/Δ = 2/3
    expect(out[6]).toBeCloseTo(1 / 3, 12) // S22 = 1/3
  })

  it('gives the table values for a shunt 20 mS admittance', () => {
    // Pozar, 4th ed., Table 4.2 (derived by hand): shunt 20 mS → S11 = −1/3, S21 = 2/3.
    const out = abcdToS(Float64Array.of(1, 0, 0, 0, 0.02, 0, 1, 0), 50, 50)
    expect(out[0]).toBeCloseTo(-1 / 3, 12)
    expect(out[4]).toBeCloseTo(2 / 3, 12)
  })

  it('gives S11 = 0.6 and S21 = −0.8j for a 100 Ω quarter-wave line', () => {
    // Pozar, 4th ed., Table 4.2 with the line's ABCD (Pozar §4.4); check value derived by hand.
    const out = abcdToS(Float64Array.of(0, 0, 0, 100, 0, 0.01, 0, 0), 50, 50)
    expect(out[0]).toBeCloseTo(0.6, 12)
    expect(out[1]).toBeCloseTo(0, 12)
    expect(out[4]).toBeCloseTo(0, 12)
    expect(out[5]).toBeCloseTo(-0.8, 12)
  })
})

describe('the same values from solved networks', () => {
  it('series block of 50 Ω', () => {
    // Pozar, 4th ed., Table 4.2 (derived by hand): S11 = 1/3, S21 = 2/3.
    const r = solveAt(doc([port(1), port(2), { id: 'Z', type: 'series', params: { resistance: 50 } }], [['P1.1', 'Z.1'], ['Z.2', 'P2.1']]), [F0])
    expect(s(r, 1, 1)[0]).toBeCloseTo(1 / 3, 12)
    expect(s(r, 2, 1)[0]).toBeCloseTo(2 / 3, 12)
    expect(s(r, 1, 2)[0]).toBeCloseTo(2 / 3, 12)
  })

  it('shunt 50 Ω load (20 mS) at a three-terminal junction', () => {
    // Pozar, 4th ed., Table 4.2 (derived by hand): shunt 20 mS → S11 = −1/3, S21 = 2/3.
    const r = solveAt(doc([port(1), port(2), { id: 'Y', type: 'load', params: { resistance: 50 } }], [['P1.1', 'Y.1'], ['Y.1', 'P2.1']]), [F0])
    expect(s(r, 1, 1)[0]).toBeCloseTo(-1 / 3, 12)
    expect(s(r, 2, 1)[0]).toBeCloseTo(2 / 3, 12)
    expect(s(r, 2, 1)[1]).toBeCloseTo(0, 12)
  })

  it('100 Ω line, a quarter wave exactly at f0 (ill-conditioned for nodal methods)', () => {
    // Pozar, 4th ed., Table 4.2 (derived by hand): S11 = 0.6, S21 = −0.8j, tested exactly at f0.
    const r = solveAt(doc([port(1), port(2), { id: 'L', type: 'line', params: { impedance: 100, degrees: 90, at: 'f0' } }], [['P1.1', 'L.1'], ['L.2', 'P2.1']]), [F0])
    expect(s(r, 1, 1)[0]).toBeCloseTo(0.6, 12)
    expect(s(r, 1, 1)[1]).toBeCloseTo(0, 12)
    expect(s(r, 2, 1)[0]).toBeCloseTo(0, 12)
    expect(s(r, 2, 1)[1]).toBeCloseTo(-0.8, 12)
    expect(s(r, 2, 2)[0]).toBeCloseTo(0.6, 12)
  })

  it('line given by length and velocity factor matches the same line given in degrees', () => {
    // λ = v_f·c0/f (common practice): a quarter wave at 2.45 GHz with v_f = 0.7.
    const quarter = (0.7 * 299_792_458) / F0 / 4
    const a = solveAt(doc([port(1), port(2), { id: 'L', type: 'line', params: { impedance: 70, length: quarter, velocityFactor: 0.7 } }], [['P1.1', 'L.1'], ['L.2', 'P2.1']]), [2e9])
    const b = solveAt(doc([port(1), port(2), { id: 'L', type: 'line', params: { impedance: 70, degrees: 90, at: 'f0' } }], [['P1.1', 'L.1'], ['L.2', 'P2.1']]), [2e9])
    expect(s(a, 2, 1)[0]).toBeCloseTo(s(b, 2, 1)[0], 12)
    expect(s(a, 1, 1)[1]).toBeCloseTo(s(b, 1, 1)[1], 12)
  })

  it('lossy line: lossDb per wavelength gives that loss over one wavelength', () => {
    // Definition of the contract's lossDb (dB per wavelength) on a matched line: |S21| = 10^(−lossDb/20) at 360°.
    const r = solveAt(doc([port(1), port(2), { id: 'L', type: 'line', params: { impedance: 50, degrees: 360, at: 'f0', lossDb: 0.5 } }], [['P1.1', 'L.1'], ['L.2', 'P2.1']]), [F0])
    expect(Math.hypot(...s(r, 2, 1))).toBeCloseTo(10 ** (-0.5 / 20), 12)
  })
})

describe('stubs', () => {
  const zin = (end: string) => {
    const r = solveAt(doc([port(1), { id: 'S', type: 'stub', params: { impedance: 50, degrees: 45, at: 'f0', end } }], [['P1.1', 'S.1']]), [F0])
    const [g, gi] = s(r, 1, 1)
    // Z = Z0 (1 + Γ)/(1 − Γ)
    const d = (1 - g) ** 2 + gi ** 2
    return [(50 * ((1 + g) * (1 - g) - gi * gi)) / d, (50 * (gi * (1 - g) + gi * (1 + g))) / d]
  }

  it('λ/8 short-circuited 50 Ω stub is +j50 Ω', () => {
    // Pozar, 4th ed., eq. 2.44 (Z_in = jZ0 tan βl).
    const [r, x] = zin('short')
    expect(r).toBeCloseTo(0, 9)
    expect(x).toBeCloseTo(50, 9)
  })

  it('λ/8 open-circuited 50 Ω stub is −j50 Ω', () => {
    // Pozar, 4th ed., eq. 2.46 (Z_in = −jZ0 cot βl).
    const [r, x] = zin('open')
    expect(r).toBeCloseTo(0, 9)
    expect(x).toBeCloseTo(-50, 9)
  })
})

describe('loads', () => {
  const gamma = (params: Record<string, unknown>, f = F0) => s(solveAt(doc([port(1), { id: 'L', type: 'load', params }], [['P1.1', 'L.1']]), [f]), 1, 1)

  it('open, short and matched ends', () => {
    // Γ = (Z − Z0)/(Z + Z0) (Pozar, 4th ed., eq. 2.35): open 1, short −1, matched 0.
    expect(gamma({ end: 'open' })).toEqual([1, 0])
    expect(gamma({ end: 'short' })[0]).toBeCloseTo(-1, 15)
    expect(Math.hypot(...gamma({ end: 'matched' }))).toBeLessThan(1e-15)
  })

  it('series R-L-C at resonance is its resistance; a capacitor is open at DC', () => {
    // Series resonance ω0 = 1/√(LC) (common practice): Z = R there, so Γ = (25 − 50)/(25 + 50) = −1/3.
    const l = 10e-9, c = 1e-12
    const f = 1 / (2 * Math.PI * Math.sqrt(l * c))
    const [re, im] = gamma({ resistance: 25, inductance: l, capacitance: c }, f)
    expect(re).toBeCloseTo(-1 / 3, 9)
    expect(im).toBeCloseTo(0, 9)
    expect(gamma({ capacitance: 1e-12 }, 0)).toEqual([1, 0])
  })
})
