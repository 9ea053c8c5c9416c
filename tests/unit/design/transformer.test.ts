import { describe, expect, it } from 'vitest'
import { binomialBandwidth, binomialSections, chebyshev, chebyshevBandwidth, chebyshevSections, designTransformer } from '../../../shared/design/index'
import { entry, expectMeetsOwnSpec, expectNoOverlap, expectOwnIds, fractionalBand, nearest, solveDesign } from './helpers'

const F0 = 4e9
const abs = (x: [number, number]) => Math.hypot(x[0], x[1])

describe('transformer sections', () => {
  it('one section is the quarter-wave transformer √(Z0·ZL) (Pozar, Microwave Engineering, 4th ed., §5.5)', () => {
    expect(binomialSections(50, 100, 1)[0]).toBeCloseTo(Math.sqrt(5000), 9)
    expect(chebyshevSections(50, 100, 1, 0.05)[0]).toBeCloseTo(Math.sqrt(5000), 9)
  })

  it('binomial: Pozar, 4th ed., Example 5.6 [memory]: three sections, 50 Ω load on 100 Ω, Γm = 0.05 → 91.7, 70.7, 54.5 Ω and 70 % bandwidth', () => {
    const z = binomialSections(100, 50, 3)
    expect(z[0]).toBeCloseTo(91.7, 1)
    expect(z[1]).toBeCloseTo(70.7, 1)
    expect(z[2]).toBeCloseTo(54.5, 1)
    expect(binomialBandwidth(100, 50, 3, 0.05)).toBeCloseTo(0.70, 1)
  })

  it('Chebyshev polynomials T_N by the recursion (Pozar, 4th ed., §5.7): T2 = 2x² − 1, T3 = 4x³ − 3x, T4 = 8x⁴ − 8x² + 1', () => {
    for (const x of [-1.3, -0.4, 0.2, 0.9, 1.7]) {
      expect(chebyshev(2, x)).toBeCloseTo(2 * x * x - 1, 12)
      expect(chebyshev(3, x)).toBeCloseTo(4 * x ** 3 - 3 * x, 12)
      expect(chebyshev(4, x)).toBeCloseTo(8 * x ** 4 - 8 * x * x + 1, 12)
    }
  })

  it('Chebyshev sections from the polynomial agree with Pozar, 4th ed., Table 5.2 (Γm = 0.05) [memory]', () => {
    // Table 5.2, N = 2: ZL/Z0 = 1.5 → 1.1347, 1.3219; 2.0 → 1.2193, 1.6402; 4.0 → 1.4500, 2.7585.
    const n2: Array<[number, number, number]> = [[1.5, 1.1347, 1.3219], [2, 1.2193, 1.6402], [4, 1.45, 2.7585]]
    for (const [ratio, z1, z2] of n2) {
      const z = chebyshevSections(1, ratio, 2, 0.05)
      expect(z[0]).toBeCloseTo(z1, 3)
      expect(z[1]).toBeCloseTo(z2, 3)
    }
    // Table 5.2, N = 3, ZL/Z0 = 2.0 → 1.1475, 1.4142, 1.7429; the table is exact synthesis, the
    // small-reflection theory used here lands within 0.3 % (Pozar, 4th ed., Example 5.7 gives
    // 57.5, 70.7, 87.0 Ω for 50 → 100 Ω by the same theory [memory]).
    const z3 = chebyshevSections(1, 2, 3, 0.05)
    ;[1.1475, 1.4142, 1.7429].forEach((want, i) => expect(Math.abs(z3[i]! / want - 1)).toBeLessThan(0.003))
    const ex = chebyshevSections(50, 100, 3, 0.05)
    ;[57.5, 70.7, 87.0].forEach((want, i) => expect(ex[i]).toBeCloseTo(want, 1))
  })
})

describe('transformer assistant', () => {
  it('places N quarter-wave lines from port 1 at Z0 to port 2 at ZL', () => {
    const document = designTransformer({ frequency: F0, impedance: 50, load: 150, sections: 4, response: 'chebyshev', maxReflection: 0.05 })
    expect(document.blocks.filter(b => b.type === 'line')).toHaveLength(4)
    expect(document.blocks.find(b => b.type === 'port' && b.params.index === 2)?.params.impedance).toBe('ZL')
    expect(document.variables?.ZL).toBe('150 ohm')
    const r = solveDesign(document)
    expect(r.impedances).toEqual([50, 150])
    // An even number of Chebyshev sections has a ripple peak at f0: |Γ(f0)| = |A·T4(0)| = Γm (Pozar, 4th ed., §5.7).
    expect(abs(entry(r, 1, 1, nearest(r, F0)))).toBeCloseTo(0.05, 2)
    expectMeetsOwnSpec(document, r)
    expectOwnIds(document)
    expectNoOverlap(document)
  })

  it('Chebyshev: ripple ≈ Γm over the band of Pozar, 4th ed., §5.7 (2 − 4θm/π), solved', () => {
    for (const [load, sections] of [[100, 2], [100, 3], [150, 4]] as const) {
      const gm = 0.05
      const document = designTransformer({ frequency: F0, impedance: 50, load, sections, response: 'chebyshev', maxReflection: gm })
      const r = solveDesign(document, 4001)
      const closed = chebyshevBandwidth(50, load, sections, gm)!
      // Small-reflection theory (Pozar, 4th ed., §5.5): for ZL/Z0 ≤ 3 the solved ripple stays within
      // 15 % of Γm and the band where |Γ| ≤ Γm within 3 % of the closed form.
      let ripple = 0
      r.frequencies.forEach((f, k) => { if (Math.abs(f / F0 - 1) < closed / 2) ripple = Math.max(ripple, abs(entry(r, 1, 1, k))) })
      expect(ripple).toBeGreaterThan(0.95 * gm)
      expect(ripple).toBeLessThan(1.15 * gm)
      const width = fractionalBand(r, F0, [{ measure: 'returnLoss', port: 1, min: -20 * Math.log10(gm) }])
      expect(Math.abs(width / closed - 1)).toBeLessThan(0.03)
      expectMeetsOwnSpec(document, r)
    }
  })

  it('binomial: |Γ| follows |A|·2^N·|cos θ|^N, A = 2^−N·(ZL − Z0)/(ZL + Z0) (Pozar, 4th ed., §5.6), solved', () => {
    const sections = 3
    const document = designTransformer({ frequency: F0, impedance: 50, load: 100, sections, response: 'binomial', maxReflection: 0.05 })
    const r = solveDesign(document)
    const a = 2 ** -sections * (50 / 150)
    for (const ratio of [0.6, 0.8, 1.2, 1.5]) {
      const k = nearest(r, ratio * F0)
      const theta = (Math.PI / 2) * (r.frequencies[k]! / F0)
      const closed = a * 2 ** sections * Math.abs(Math.cos(theta)) ** sections
      expect(Math.abs(abs(entry(r, 1, 1, k)) - closed)).toBeLessThan(0.01)
    }
    const width = fractionalBand(r, F0, [{ measure: 'returnLoss', port: 1, min: -20 * Math.log10(0.05) }])
    expect(width).toBeCloseTo(binomialBandwidth(50, 100, sections, 0.05), 1)
    expectMeetsOwnSpec(document, r)
  })

  it('one section: the swept band equals Pozar, 4th ed., eq. 5.64', () => {
    const gm = 0.1
    const closed = 2 - (4 / Math.PI) * Math.acos((gm / Math.sqrt(1 - gm * gm)) * (2 * Math.sqrt(50 * 100)) / 50)
    const r = solveDesign(designTransformer({ frequency: F0, impedance: 50, load: 100, sections: 1, response: 'binomial', maxReflection: gm }), 4001)
    expect(fractionalBand(r, F0, [{ measure: 'returnLoss', port: 1, min: 20 }])).toBeCloseTo(closed, 4)
  })
})
