import { describe, expect, it } from 'vitest'
import {
  amplitudeImbalance, coupling, directivity, groupDelay, insertionLoss, isolation, magnitudeDb,
  phaseDeg, phaseDifference, returnLoss, sParameter, unwrapPhaseDeg, vswr,
} from '../../../shared/rf/index'
import { doc, port, solveAt } from '../solver/helpers'

const series = (...values: Array<[number, number]>) => ({ re: Float64Array.from(values, v => v[0]), im: Float64Array.from(values, v => v[1]) })

describe('level figures', () => {
  it('dB of magnitudes', () => {
    // 20·log10(0.5) = −6.0206 dB, 20·log10(1/√2) = −3.0103 dB (common practice).
    const db = magnitudeDb(series([0.5, 0], [0, Math.SQRT1_2], [0, 0]))
    expect(db[0]).toBeCloseTo(-6.0206, 4)
    expect(db[1]).toBeCloseTo(-3.0103, 4)
    expect(db[2]).toBe(-Infinity)
  })

  it('return loss, VSWR, insertion loss, isolation, coupling', () => {
    // Blank & Buntschuh, Handbook of Microwave Technology, vol. I, ch. 7 [memory]; also Pozar, 4th ed., §2.3: RL = −20 log|Γ|;
    // VSWR = (1 + |Γ|)/(1 − |Γ|): |Γ| = 1/3 gives 2, |Γ| = 0.1 gives 1.2222 and RL 20 dB.
    const gamma = series([1 / 3, 0], [0, 0.1], [1, 0])
    expect(returnLoss(gamma)[1]).toBeCloseTo(20, 12)
    expect(vswr(gamma)[0]).toBeCloseTo(2, 12)
    expect(vswr(gamma)[1]).toBeCloseTo(1.1 / 0.9, 12)
    expect(vswr(gamma)[2]).toBe(Infinity)
    const t = series([0, -Math.SQRT1_2], [0.01, 0])
    expect(insertionLoss(t)[0]).toBeCloseTo(3.0103, 4)
    expect(isolation(t)[1]).toBeCloseTo(40, 12)
    expect(coupling(t)[0]).toBeCloseTo(3.0103, 4)
  })

  it('directivity is isolation minus coupling', () => {
    // Pozar, Microwave Engineering, 4th ed., §7.3 (directional couplers, eq. 7.23): directivity = isolation − coupling; |S31| = 0.1 (20 dB), |S41| = 0.001 (60 dB) → 40 dB.
    expect(directivity(series([0.1, 0]), series([0, 0.001]))[0]).toBeCloseTo(40, 12)
  })

  it('amplitude imbalance and phase difference between two transmissions', () => {
    // Ideal quadrature split (Pozar, 4th ed., §7.5, eq. 7.69, branch-line S-matrix): S21 = −j/√2, S31 = −1/√2 → 0 dB imbalance and S21 leads S31 by 90°.
    const s21 = series([0, -Math.SQRT1_2], [0.5, 0]), s31 = series([-Math.SQRT1_2, 0], [0.25, 0])
    expect(amplitudeImbalance(s21, s31)[0]).toBeCloseTo(0, 12)
    expect(amplitudeImbalance(s21, s31)[1]).toBeCloseTo(6.0206, 4)
    expect(phaseDifference(s21, s31)[0]).toBeCloseTo(90, 12)
    expect(phaseDifference(s21, s31)[1]).toBeCloseTo(0, 12)
  })
})

describe('phase figures', () => {
  it('wraps to (−180°, 180°] and unwraps a steadily falling phase', () => {
    expect(Array.from(phaseDeg(series([-1, 0], [0, -1], [1, 1])))).toEqual([180, -90, 45])
    // A line's phase falls linearly with frequency (common practice); wrapped it jumps by 360°.
    const wrapped = Float64Array.from([170, -170, -150, 170, 150])
    expect(Array.from(unwrapPhaseDeg(wrapped))).toEqual([170, 190, 210, 170, 150])
  })

  it('group delay of a matched line is its length over the phase velocity', () => {
    // τ = −dφ/dω (Pozar, 4th ed., §2.7, group velocity and delay) [memory for the section]; a 90° line at f0 has τ = 1/(4 f0) at every frequency (Pozar, 4th ed., §2.1, TEM line).
    const f0 = 2.45e9
    const freqs = Array.from({ length: 41 }, (_, k) => 1e9 + k * 0.1e9)
    const r = solveAt(doc([port(1), port(2), { id: 'L', type: 'line', params: { impedance: 50, degrees: 90, at: 'f0' } }], [['P1.1', 'L.1'], ['L.2', 'P2.1']]), freqs)
    const tau = groupDelay(sParameter(r, 2, 1), r.frequencies)
    for (const value of tau) expect(value).toBeCloseTo(1 / (4 * f0), 18)
    expect(Number.isNaN(groupDelay(series([1, 0]), Float64Array.of(1e9))[0])).toBe(true)
  })
})

describe('S-parameter extraction', () => {
  it('picks S(to, from) with ports counted from 1 and refuses ports that do not exist', () => {
    const data = { ports: 2, frequencies: Float64Array.of(1, 2), re: Float64Array.of(1, 2, 3, 4, 5, 6, 7, 8), im: new Float64Array(8) }
    expect(Array.from(sParameter(data, 2, 1).re)).toEqual([3, 7])
    expect(Array.from(sParameter(data, 1, 2).re)).toEqual([2, 6])
    expect(() => sParameter(data, 3, 1)).toThrow(/S31 does not exist in a 2-port/)
  })
})
