import { describe, expect, it } from 'vitest'
import { coupledLineModes, designCoupledLine } from '../../../shared/design/index'
import { entry, expectMeetsOwnSpec, expectNoOverlap, expectOwnIds, fractionalBand, nearest, solveDesign } from './helpers'

const F0 = 3e9
const abs = (x: [number, number]) => Math.hypot(x[0], x[1])
const deg = (x: [number, number]) => (Math.atan2(x[1], x[0]) * 180) / Math.PI

describe('coupled-line assistant', () => {
  it('Pozar, Microwave Engineering, 4th ed., Example 7.7 [memory]: 20 dB, Z0 = 50 Ω → Z0e = 55.28 Ω, Z0o = 45.23 Ω', () => {
    const modes = coupledLineModes(0.1)
    expect(modes.even * 50).toBeCloseTo(55.28, 2)
    expect(modes.odd * 50).toBeCloseTo(45.23, 2)
    // Z0e·Z0o = Z0² (Pozar, 4th ed., §7.6).
    expect(modes.even * modes.odd).toBeCloseTo(1, 12)
  })

  it('places one quarter-wave coupled block: −C dB to port 3 in quadrature with port 2, matched and isolated at f0 (Pozar, 4th ed., §7.6)', () => {
    const document = designCoupledLine({ frequency: F0, impedance: 50, couplingDb: 10 })
    const coupled = document.blocks.filter(b => b.type === 'coupled')
    expect(coupled).toHaveLength(1)
    expect(coupled[0]!.params).toMatchObject({ degrees: 90, at: 'f0' })
    const r = solveDesign(document)
    const k = nearest(r, F0)
    expect(20 * Math.log10(abs(entry(r, 3, 1, k)))).toBeCloseTo(-10, 6)
    expect(deg(entry(r, 3, 1, k)) - deg(entry(r, 2, 1, k))).toBeCloseTo(90, 6)
    expect(abs(entry(r, 1, 1, k))).toBeLessThan(1e-9)
    expect(abs(entry(r, 4, 1, k))).toBeLessThan(1e-9)
    expectMeetsOwnSpec(document, r)
    expectOwnIds(document)
    expectNoOverlap(document)
  })

  it('coupling within ±0.5 dB over the band the closed form gives: |V3/V1|² = C²sin²θ/(1 − C²cos²θ) (Pozar, 4th ed., §7.6)', () => {
    const couplingDb = 15
    const c = 10 ** (-couplingDb / 20)
    // Edge where the coupling falls 0.5 dB: C²sin²θ/(1 − C²cos²θ) = C²·10^(−0.05), solved for sin²θ.
    const l = 10 ** (-0.05)
    const sin2 = (l * (1 - c * c)) / (1 - l * c * c)
    const closed = 2 * (1 - (2 / Math.PI) * Math.asin(Math.sqrt(sin2)))
    const r = solveDesign(designCoupledLine({ frequency: F0, impedance: 50, couplingDb }))
    const width = fractionalBand(r, F0, [{ measure: 'coupling', from: 1, to: 3, max: couplingDb + 0.5 }])
    expect(width).toBeCloseTo(closed, 3)
  })
})
