import { describe, expect, it } from 'vitest'
import { branchLineSections, designQuadrature } from '../../../shared/design/index'
import { entry, expectMeetsOwnSpec, expectNoOverlap, expectOwnIds, fractionalBand, nearest, solveDesign } from './helpers'

const F0 = 2.45e9
const abs = (x: [number, number]) => Math.hypot(x[0], x[1])
const deg = (x: [number, number]) => (Math.atan2(x[1], x[0]) * 180) / Math.PI
/** Angle wrapped to (−180°, 180°]. */
const wrap = (d: number) => 180 - ((((180 - d) % 360) + 360) % 360)
const MATCHED = [{ measure: 'returnLoss', port: 1, min: 20 }, { measure: 'isolation', from: 1, to: 4, min: 20 }] as const

describe('quadrature assistant', () => {
  it('one equal-split section: arms Z0/√2 and Z0 (Pozar, Microwave Engineering, 4th ed., §7.5)', () => {
    const arms = branchLineSections(Math.SQRT1_2, 1)
    expect(arms.series[0]).toBeCloseTo(Math.SQRT1_2, 12)
    expect(arms.branches).toEqual([1, 1].map(x => expect.closeTo(x, 12)))
  })

  it('one section at f0 is the textbook hybrid: −3.01 dB each, through at −90°, coupled at −180° (Pozar, 4th ed., §7.5)', () => {
    const document = designQuadrature({ frequency: F0, impedance: 50 })
    const r = solveDesign(document)
    const k = nearest(r, F0)
    expect(r.frequencies[k]).toBeCloseTo(F0, -1)
    expect(abs(entry(r, 1, 1, k))).toBeLessThan(1e-9)
    expect(abs(entry(r, 4, 1, k))).toBeLessThan(1e-9)
    expect(abs(entry(r, 2, 1, k))).toBeCloseTo(Math.SQRT1_2, 9)
    expect(abs(entry(r, 3, 1, k))).toBeCloseTo(Math.SQRT1_2, 9)
    expect(deg(entry(r, 2, 1, k))).toBeCloseTo(-90, 6)
    expect(Math.abs(deg(entry(r, 3, 1, k)))).toBeCloseTo(180, 6)
    expectMeetsOwnSpec(document, r)
    expectOwnIds(document)
    expectNoOverlap(document)
  })

  it('unequal coupling: series √(1 − c²)·Z0, branches that over c; |S31| = c at f0 (Pozar, 4th ed., §7.5)', () => {
    const c = 10 ** (-6 / 20)
    const arms = branchLineSections(c, 1)
    expect(arms.series[0]).toBeCloseTo(Math.sqrt(1 - c * c), 12)
    expect(arms.branches[0]).toBeCloseTo(Math.sqrt(1 - c * c) / c, 12)
    const document = designQuadrature({ frequency: F0, impedance: 50, couplingDb: 6 })
    const r = solveDesign(document)
    const k = nearest(r, F0)
    expect(20 * Math.log10(abs(entry(r, 3, 1, k)))).toBeCloseTo(-6, 6)
    expect(abs(entry(r, 1, 1, k))).toBeLessThan(1e-9)
    expectMeetsOwnSpec(document, r)
  })

  it('two- and three-section designs are matched, isolated and split as asked at f0 (derived by hand: even/odd half circuits at f0)', () => {
    for (const couplingDb of [10 * Math.log10(2), 6, 10]) {
      for (const sections of [2, 3] as const) {
        const document = designQuadrature({ frequency: F0, impedance: 50, couplingDb, sections })
        const r = solveDesign(document)
        const k = nearest(r, F0)
        expect(abs(entry(r, 1, 1, k))).toBeLessThan(1e-6)
        expect(abs(entry(r, 4, 1, k))).toBeLessThan(1e-6)
        expect(-20 * Math.log10(abs(entry(r, 3, 1, k)))).toBeCloseTo(couplingDb, 5)
        // Through leads coupled by 90° (Pozar, 4th ed., §7.5), whatever the number of sections.
        expect(wrap(deg(entry(r, 2, 1, k)) - deg(entry(r, 3, 1, k)))).toBeCloseTo(90, 4)
        expectMeetsOwnSpec(document, r)
        expectNoOverlap(document)
      }
    }
  })

  it('more sections widen the 20 dB return-loss and isolation band (solved)', () => {
    const widths = ([1, 2, 3] as const).map(sections => fractionalBand(solveDesign(designQuadrature({ frequency: F0, impedance: 50, sections })), F0, [...MATCHED]))
    // One section: about 10 % (common practice: 10–20 % usable).
    expect(widths[0]).toBeGreaterThan(0.09)
    expect(widths[0]).toBeLessThan(0.12)
    expect(widths[1]).toBeGreaterThan(2 * widths[0]!)
    expect(widths[2]).toBeGreaterThan(1.5 * widths[1]!)
  })
})

describe('fast branch-line response used to choose the arms', () => {
  it('equals the full solve of the placed lines at every frequency (even/odd modes, Pozar, 4th ed., §7.5)', async () => {
    const { branchLineResponse } = await import('../../../shared/design/branch-line-response')
    const c = 10 ** (-6 / 20)
    const arms = branchLineSections(c, 3)
    const r = solveDesign(designQuadrature({ frequency: F0, impedance: 50, couplingDb: 6, sections: 3 }), 41)
    r.frequencies.forEach((f, k) => {
      const fast = branchLineResponse(arms.branches.map(z => 1 / z), arms.series, f / F0)
      expect(fast.s11).toBeCloseTo(abs(entry(r, 1, 1, k)), 8)
      expect(fast.s21).toBeCloseTo(abs(entry(r, 2, 1, k)), 8)
      expect(fast.s31).toBeCloseTo(abs(entry(r, 3, 1, k)), 8)
      expect(fast.s41).toBeCloseTo(abs(entry(r, 4, 1, k)), 8)
    })
  })
})
