import { describe, expect, it } from 'vitest'
import { specFrequencies, specMeets, UNMEASURABLE_SHORTFALL } from '../../../shared/rf/index'
import { sweepFrequencies } from '../../../shared/solver/index'
import { doc, port, solveAt } from '../solver/helpers'

const F0 = 2.45e9
const load = (resistance: number) => doc([port(1), { id: 'R', type: 'load', params: { resistance } }], [['P1.1', 'R.1']])

describe('specMeets', () => {
  it('a 100 Ω load in 50 Ω: |Γ| = 1/3, RL = 9.54 dB; met below that limit, short by the difference above it', () => {
    // Γ = (ZL − Z0)/(ZL + Z0) (Pozar, Microwave Engineering, 4th ed., eq. 2.35) = 1/3; RL = −20·log10(1/3).
    const rl = -20 * Math.log10(1 / 3)
    const data = solveAt(load(100), [1e9])
    const pass = specMeets(data, { center: 1e9, conditions: [{ measure: 'returnLoss', port: 1, min: 9 }] })
    expect(pass).toMatchObject({ met: true, goal: 0, checked: 1 })
    expect(pass.worst.margin).toBeCloseTo(rl - 9, 12)
    const fail = specMeets(data, { center: 1e9, conditions: [{ measure: 'returnLoss', port: 1, min: 10 }, { measure: 'vswr', port: 1, max: 1.5 }] }, { weights: [1, 4] })
    // VSWR = (1 + 1/3)/(1 − 1/3) = 2 (Pozar, 4th ed., eq. 2.41): short by 0.5, weighted ×4.
    expect(fail.met).toBe(false)
    expect(fail.goal).toBeCloseTo((10 - rl) ** 2 + 4 * 0.5 ** 2, 10)
    expect(fail.worst).toMatchObject({ condition: 1, frequency: 1e9 })
  })

  it('judges only the sweep frequencies inside the band: a quarter-wave transformer meets a band inside its closed-form bandwidth, not a wider one', () => {
    // Pozar, Microwave Engineering, 4th ed., eq. 5.64: 50 Ω → 100 Ω, Γm = 0.1 gives Δf/f0 = 2 − (4/π)·acos(…).
    const gm = 0.1
    const fractional = 2 - (4 / Math.PI) * Math.acos((gm / Math.sqrt(1 - gm * gm)) * (2 * Math.sqrt(5000)) / 50)
    const network = doc([port(1), port(2, { impedance: 100 }), { id: 'T', type: 'line', params: { impedance: Math.sqrt(5000), degrees: 90, at: 'f0' } }], [['P1.1', 'T.1'], ['T.2', 'P2.1']])
    const sweep = sweepFrequencies({ start: 1.2e9, stop: 3.7e9, points: 2501 })
    const data = solveAt(network, Array.from(sweep))
    const condition = { measure: 'returnLoss' as const, port: 1, min: -20 * Math.log10(gm) }
    const band = (scale: number) => ({ start: F0 * (1 - (scale * fractional) / 2), stop: F0 * (1 + (scale * fractional) / 2) })
    const inside = { center: F0, band: band(0.98), conditions: [condition] }
    const wider = { center: F0, band: band(1.03), conditions: [condition] }
    const judged = specMeets(data, inside)
    expect(judged.met).toBe(true)
    expect(judged.checked).toBe(specFrequencies(inside, sweep).length)
    expect(judged.checked).toBeGreaterThan(100)
    const missed = specMeets(data, wider)
    expect(missed.met).toBe(false)
    expect(missed.goal).toBeGreaterThan(0)
  })

  it('counts an unmeasurable margin (NaN) as a capped shortfall and refuses data without the judged frequency', () => {
    // Nothing reaches ports 2 and 3 (S21 = S31 = 0): the imbalance −∞ − (−∞) dB is NaN.
    const data = { ports: 3, frequencies: Float64Array.of(1e9), re: new Float64Array(9), im: new Float64Array(9) }
    const check = specMeets(data, { center: 1e9, conditions: [{ measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 1 }] })
    expect(check.met).toBe(false)
    expect(check.goal).toBe(UNMEASURABLE_SHORTFALL ** 2)
    expect(() => specMeets(data, { center: 2e9, conditions: [] })).toThrow(/centre frequency/)
  })
})
