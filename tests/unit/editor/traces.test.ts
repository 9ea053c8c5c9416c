import { describe, expect, it } from 'vitest'
import { groupDelay, nearestIndex, parseTraceName, phaseDifference, toDb, toPhaseDeg, toVswr, traceName, traceSamples, unwrapDeg } from '../../../app/utils/editor/traces'
import { balance, worstDeviation } from '../../../app/utils/editor/balance'
import { specPasses, widestBand } from '../../../app/utils/editor/spec'
import { resultsTable, toTsv } from '../../../app/utils/editor/resultsTable'
import type { SolvedData } from '../../../app/workers/protocol'

/** An ideal quadrature hybrid (Pozar §7.5) over three frequencies: S = −(1/√2)[[0, j, 1, 0], [j, 0, 0, 1], [1, 0, 0, j], [0, 1, j, 0]]. */
function idealHybrid(): SolvedData {
  const a = -1 / Math.SQRT2
  const s: Array<Array<[number, number]>> = [
    [[0, 0], [0, a], [a, 0], [0, 0]],
    [[0, a], [0, 0], [0, 0], [a, 0]],
    [[a, 0], [0, 0], [0, 0], [0, a]],
    [[0, 0], [a, 0], [0, a], [0, 0]],
  ]
  const n = 3
  const re = new Float64Array(n * 16)
  const im = new Float64Array(n * 16)
  for (let k = 0; k < n; k++) for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) {
    re[(k * 4 + i) * 4 + j] = s[i]![j]![0]
    im[(k * 4 + i) * 4 + j] = s[i]![j]![1]
  }
  return { ports: 4, impedances: [50, 50, 50, 50], frequencies: new Float64Array([2e9, 2.45e9, 3e9]), re, im }
}

describe('traces', () => {
  it('names and parses S-parameters', () => {
    expect(traceName({ i: 2, j: 1 }, 4)).toBe('S21')
    expect(traceName({ i: 10, j: 2 }, 12)).toBe('S10,2')
    expect(parseTraceName('S31', 4)).toEqual({ i: 3, j: 1 })
    expect(parseTraceName('S51', 4)).toBeNull()
  })

  it('reads the ideal hybrid: −3.01 dB at −90° and 180°, 90° apart', () => {
    const r = idealHybrid()
    const s21 = traceSamples(r, { i: 2, j: 1 })
    const s31 = traceSamples(r, { i: 3, j: 1 })
    expect(toDb(s21.re, s21.im)[1]).toBeCloseTo(-3.0103, 4)
    expect(toPhaseDeg(s21.re, s21.im)[1]).toBeCloseTo(-90, 9)
    expect(Math.abs(toPhaseDeg(s31.re, s31.im)[1]!)).toBeCloseTo(180, 9)
    const b = balance(r, { i: 2, j: 1 }, { i: 3, j: 1 })
    expect(b.db[1]).toBeCloseTo(0, 12)
    expect(b.deg[1]).toBeCloseTo(90, 9)
    expect(worstDeviation(b.deg, 90, true)).toBeCloseTo(0, 9)
  })

  it('unwraps phase and gives the delay of a pure time shift', () => {
    const tau = 1.5e-9
    const f = Float64Array.from({ length: 101 }, (_, k) => 1e9 + k * 1e7)
    const wrapped = f.map(x => phaseDifference((-360 * x * tau) % 360, 0))
    const unwrapped = unwrapDeg(wrapped)
    for (let k = 1; k < f.length; k++) expect(unwrapped[k]! - unwrapped[k - 1]!).toBeCloseTo(-360 * 1e7 * tau, 6)
    for (const d of groupDelay(f, unwrapped)) expect(d).toBeCloseTo(tau, 15)
  })

  it('gives VSWR 1 for a match, 3 for |Γ| = 0.5, infinite for total reflection', () => {
    expect([...toVswr(new Float64Array([0, 0.5, -1]), new Float64Array([0, 0, 0]))]).toEqual([1, 3, Number.POSITIVE_INFINITY])
  })

  it('finds the nearest sweep point', () => {
    const f = [1, 2, 3, 4]
    expect(nearestIndex(f, 2.4)).toBe(1)
    expect(nearestIndex(f, 2.6)).toBe(2)
    expect(nearestIndex(f, 99)).toBe(3)
    expect(nearestIndex(f, -5)).toBe(0)
  })

  it('wraps phase differences to (−180°, 180°]', () => {
    expect(phaseDifference(-90, 180)).toBe(90)
    expect(phaseDifference(170, -170)).toBe(-20)
    expect(phaseDifference(180, 0)).toBe(180)
  })
})

describe('spec mask and band', () => {
  it('passes the ideal hybrid everywhere and fails an impossible return-loss limit', () => {
    const r = idealHybrid()
    const mask = { returnLossDb: 20, ports: [1, 2, 3, 4], pair: { a: { i: 2, j: 1 }, b: { i: 3, j: 1 } }, maxImbalanceDb: 0.5, targetPhaseDeg: 90, phaseToleranceDeg: 2 }
    expect(specPasses(r, mask)).toEqual([true, true, true])
    expect(specPasses(r, { ...mask, targetPhaseDeg: 0 })).toEqual([false, false, false])
  })

  it('finds the widest passing band and its fractional width', () => {
    const f = [1, 2, 3, 4, 5, 6]
    expect(widestBand(f, [true, false, true, true, true, false])).toEqual({ low: 3, high: 5, fractional: 0.5 })
    expect(widestBand(f, [false, false, false, false, false, false])).toBeNull()
  })
})

describe('results table', () => {
  it('lays out frequency, dB and degrees per trace, and copies as tab-separated text', () => {
    const t = resultsTable(idealHybrid(), ['S21'])
    expect(t.header).toEqual(['Frequency (Hz)', 'S21 dB', 'S21 deg'])
    expect(t.rows).toHaveLength(3)
    expect(t.rows[1]![0]).toBe(2.45e9)
    expect(t.rows[1]![2]).toBeCloseTo(-90, 9)
    const tsv = toTsv(['a', 'b'], [[1, Number.NaN]])
    expect(tsv).toBe('a\tb\n1\t\n')
  })
})
