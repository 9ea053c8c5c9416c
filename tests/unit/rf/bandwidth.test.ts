import { describe, expect, it } from 'vitest'
import { branchLineHybrid } from '../../../shared/examples/index'
import { findBandwidth } from '../../../shared/rf/index'
import { sweepFrequencies } from '../../../shared/solver/index'
import { doc, port, solveAt } from '../solver/helpers'

const F0 = 2.45e9

describe('spec-mask bandwidth', () => {
  it('quarter-wave transformer: swept bandwidth equals the closed form', () => {
    // Pozar, Microwave Engineering, 4th ed., eq. 5.64: for Z0 = 50 Ω, RL = 100 Ω, Γm = 0.1,
    // Δf/f0 = 2 − (4/π)·acos[(Γm/√(1 − Γm²))·2√(Z0 RL)/|RL − Z0|].
    const z0 = 50, rl = 100, gm = 0.1
    const closed = 2 - (4 / Math.PI) * Math.acos((gm / Math.sqrt(1 - gm * gm)) * (2 * Math.sqrt(z0 * rl)) / Math.abs(rl - z0))
    const network = doc([port(1), port(2, { impedance: rl }), { id: 'T', type: 'line', params: { impedance: Math.sqrt(z0 * rl), degrees: 90, at: 'f0' } }], [['P1.1', 'T.1'], ['T.2', 'P2.1']])
    const r = solveAt(network, Array.from(sweepFrequencies({ start: 1.2e9, stop: 3.7e9, points: 2501 })))
    const band = findBandwidth(r, { center: F0, conditions: [{ measure: 'returnLoss', port: 1, min: -20 * Math.log10(gm) }] })
    expect(band.ok).toBe(true)
    if (!band.ok) return
    expect(band.fractional).toBeCloseTo(closed, 5)
    // TEM response is symmetric about f0 (Pozar, 4th ed., §5.5), so the band is centred on it.
    expect((band.low + band.high) / 2).toBeCloseTo(F0, -3)
    expect(band.lowLimit).toBe('return loss at port 1 ≥ 20 dB')
  })

  it('branch-line hybrid: every condition of a combined spec limits the band it should', () => {
    const r = solveAt(branchLineHybrid, Array.from(sweepFrequencies({ start: 1.8e9, stop: 3.1e9, points: 1301 })))
    const rl = findBandwidth(r, { center: F0, conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] })
    const all = findBandwidth(r, {
      center: F0,
      conditions: [
        { measure: 'returnLoss', port: 1, min: 20 },
        { measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.5 },
        { measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 2 },
        { measure: 'isolation', from: 1, to: 4, min: 20 },
      ],
    })
    const tight = findBandwidth(r, { center: F0, conditions: [{ measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.1 }] })
    expect(rl.ok && all.ok && tight.ok).toBe(true)
    if (!rl.ok || !all.ok || !tight.ok) return
    // Adding conditions can only narrow the band (common practice).
    expect(all.width).toBeLessThanOrEqual(rl.width + 1)
    expect(tight.width).toBeLessThan(all.width)
    expect(tight.lowLimit).toMatch(/amplitude imbalance S21\/S31 ≤ 0\.1 dB/)
  })

  it('says why when the centre fails or lies outside the sweep', () => {
    const r = solveAt(branchLineHybrid, Array.from(sweepFrequencies({ start: 2e9, stop: 3e9, points: 101 })))
    const failing = findBandwidth(r, { center: 2.1e9, conditions: [{ measure: 'vswr', port: 1, max: 1.1 }] })
    expect(failing).toEqual({ ok: false, reason: 'the spec is not met at the centre: VSWR at port 1 ≤ 1.1 fails' })
    expect(findBandwidth(r, { center: 5e9, conditions: [{ measure: 'vswr', port: 1, max: 2 }] }).ok).toBe(false)
    const wide = findBandwidth(r, { center: F0, conditions: [{ measure: 'insertionLoss', from: 1, to: 2, max: 10 }] })
    expect(wide.ok && wide.lowLimit === 'sweep' && wide.highLimit === 'sweep').toBe(true)
  })
})
