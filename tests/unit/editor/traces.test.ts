import { describe, expect, it } from 'vitest'
import { allTraces, defaultTraces, nearestIndex, parseTraceName, phaseDifference, traceName, traceQuantity, traceSamples } from '../../../app/utils/editor/traces'
import { columnTraces, gridSize, reflectionTraces, rowTraces, toggleGroup } from '../../../app/utils/editor/traceGrid'
import { balance, worstDeviation } from '../../../app/utils/editor/balance'
import { findBandwidth } from '~~/shared/rf'
import type { SpecMask } from '~~/shared/rf'
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
    expect(traceQuantity(r, { i: 2, j: 1 }, 'db')[1]).toBeCloseTo(-3.0103, 4)
    expect(traceQuantity(r, { i: 2, j: 1 }, 'phase')[1]).toBeCloseTo(-90, 9)
    expect(Math.abs(traceQuantity(r, { i: 3, j: 1 }, 'phase')[1]!)).toBeCloseTo(180, 9)
    expect(traceQuantity(r, { i: 1, j: 1 }, 'vswr')[1]).toBe(1)
    expect(traceQuantity(r, { i: 2, j: 1 }, 'delay')[1]).toBeCloseTo(0, 20)
    expect(traceSamples(r, { i: 4, j: 2 }).re[0]).toBeCloseTo(-1 / Math.SQRT2, 15)
    const b = balance(r, { i: 2, j: 1 }, { i: 3, j: 1 })
    expect(b.db[1]).toBeCloseTo(0, 12)
    expect(b.deg[1]).toBeCloseTo(90, 9)
    expect(worstDeviation(b.deg, 90, true)).toBeCloseTo(0, 9)
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

describe('spec form', () => {
  it('the bandwidth finder passes the ideal hybrid for a 90° target and fails it for 0°', () => {
    const r = idealHybrid()
    const mask: SpecMask = {
      center: 2.45e9,
      conditions: [
        ...[1, 2, 3, 4].map(port => ({ measure: 'returnLoss' as const, port, min: 20 })),
        { measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.5 },
        { measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 2 },
      ],
    }
    const band = findBandwidth(r, mask)
    expect(band.ok && [band.low, band.high]).toEqual([2e9, 3e9])
    const wrongTarget = { ...mask, conditions: mask.conditions.map(c => c.measure === 'phaseDifference' ? { ...c, target: 0 } : c) }
    expect(findBandwidth(r, wrongTarget).ok).toBe(false)
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

describe('trace grid', () => {
  it('chooses defaults that fit the network', () => {
    expect(defaultTraces(2)).toEqual(['S11', 'S21'])
    expect(defaultTraces(4)).toEqual(['S11', 'S21', 'S31', 'S41'])
    const eight = defaultTraces(8)
    expect(eight.slice(0, 8)).toEqual(['S11', 'S22', 'S33', 'S44', 'S55', 'S66', 'S77', 'S88'])
    expect(eight.slice(8)).toEqual(['S21', 'S31', 'S41', 'S51', 'S61', 'S71', 'S81'])
  })

  it('reads rows as "to" and columns as "from", and toggles a group in one click', () => {
    expect(rowTraces(2, 3)).toEqual(['S21', 'S22', 'S23'])
    expect(columnTraces(1, 3)).toEqual(['S11', 'S21', 'S31'])
    expect(reflectionTraces(3)).toEqual(['S11', 'S22', 'S33'])
    expect(toggleGroup(['S21'], columnTraces(1, 3))).toEqual(['S21', 'S11', 'S31'])
    expect(toggleGroup(['S11', 'S21', 'S31', 'S22'], columnTraces(1, 3))).toEqual(['S22'])
  })

  it('recognises a full N×N set, including two-digit port names', () => {
    expect(gridSize(allTraces(4))).toBe(4)
    expect(gridSize(allTraces(12))).toBe(12)
    expect(gridSize(['S11', 'S22'])).toBe(0)
  })
})
