import { describe, expect, it } from 'vitest'
import { designDivider, designRing, dividerArms } from '../../../shared/design/index'
import { entry, expectMeetsOwnSpec, expectNoOverlap, expectOwnIds, nearest, solveDesign } from './helpers'

const F0 = 1.8e9
const H = Math.SQRT1_2
const dist = (a: [number, number], b: [number, number]) => Math.hypot(a[0] - b[0], a[1] - b[1])
const abs = (x: [number, number]) => Math.hypot(x[0], x[1])

describe('ring assistant', () => {
  it('at f0 equals the ring hybrid S = (−j/√2)[[0, 1, 1, 0], [1, 0, 0, −1], [1, 0, 0, 1], [0, −1, 1, 0]] (Pozar, Microwave Engineering, 4th ed., §7.8)', () => {
    const document = designRing({ frequency: F0, impedance: 75 })
    expect(document.variables?.Zr).toBe('sqrt(2) * Z0')
    const r = solveDesign(document)
    const k = nearest(r, F0)
    expect(r.frequencies[k]).toBeCloseTo(F0, -1)
    const want: Array<Array<[number, number]>> = [
      [[0, 0], [0, -H], [0, -H], [0, 0]],
      [[0, -H], [0, 0], [0, 0], [0, H]],
      [[0, -H], [0, 0], [0, 0], [0, -H]],
      [[0, 0], [0, H], [0, -H], [0, 0]],
    ]
    want.forEach((row, i) => row.forEach((value, j) => expect(dist(entry(r, i + 1, j + 1, k), value)).toBeLessThan(1e-9)))
    expectMeetsOwnSpec(document, r)
    expectOwnIds(document)
    expectNoOverlap(document)
  })
})

describe('divider assistant', () => {
  it('equal split: √2·Z0 arms and a 2·Z0 resistor, S = (−j/√2)[[0, 1, 1], [1, 0, 0], [1, 0, 0]] at f0 (Pozar, 4th ed., §7.3)', () => {
    const arms = dividerArms(0)
    expect(arms.arm2).toBeCloseTo(Math.SQRT2, 12)
    expect(arms.arm3).toBeCloseTo(Math.SQRT2, 12)
    expect(arms.resistor).toBeCloseTo(2, 12)
    const document = designDivider({ frequency: F0, impedance: 50 })
    const r = solveDesign(document)
    const k = nearest(r, F0)
    expect(dist(entry(r, 2, 1, k), [0, -H])).toBeLessThan(1e-9)
    expect(dist(entry(r, 3, 1, k), [0, -H])).toBeLessThan(1e-9)
    for (const [i, j] of [[1, 1], [2, 2], [3, 3], [2, 3]]) expect(abs(entry(r, i!, j!, k))).toBeLessThan(1e-9)
    expectMeetsOwnSpec(document, r)
    expectOwnIds(document)
    expectNoOverlap(document)
  })

  it('unequal split, 3 dB (P3 = P2/2), Z0 = 50 Ω: Pozar, 4th ed., §7.3, eqs. 7.37–7.39', () => {
    // Derived by hand from eqs. 7.37–7.39 with K² = 0.5: Z03 = 50·√(1.5/0.70711^3) = 102.99 Ω,
    // Z02 = K²·Z03 = 51.49 Ω, R = 50·(0.70711 + 1.41421) = 106.07 Ω.
    const arms = dividerArms(10 * Math.log10(2))
    expect(arms.arm3 * 50).toBeCloseTo(102.99, 2)
    expect(arms.arm2 * 50).toBeCloseTo(51.49, 2)
    expect(arms.resistor * 50).toBeCloseTo(106.07, 2)
    // Outputs at Z0·K = 35.36 Ω and Z0/K = 70.7 Ω, brought back to Z0 by quarter-wave transformers (Pozar, 4th ed., §7.3).
    expect(arms.out2 * 50).toBeCloseTo(Math.sqrt(50 * 50 * Math.SQRT1_2), 9)
    expect(arms.out3 * 50).toBeCloseTo(Math.sqrt(50 * 50 * Math.SQRT2), 9)
  })

  it('unequal split: power at 2 over 3 equals R dB, every port matched and the outputs isolated at f0 (solved)', () => {
    for (const ratioDb of [3, -6, 10]) {
      const document = designDivider({ frequency: F0, impedance: 50, ratioDb })
      const r = solveDesign(document)
      const k = nearest(r, F0)
      expect(20 * Math.log10(abs(entry(r, 2, 1, k)) / abs(entry(r, 3, 1, k)))).toBeCloseTo(ratioDb, 6)
      expect(abs(entry(r, 2, 1, k)) ** 2 + abs(entry(r, 3, 1, k)) ** 2).toBeCloseTo(1, 9)
      for (const [i, j] of [[1, 1], [2, 2], [3, 3], [2, 3]]) expect(abs(entry(r, i!, j!, k))).toBeLessThan(1e-6)
      expectMeetsOwnSpec(document, r)
      expectNoOverlap(document)
    }
  })
})
