// Writing and reading back: the writer follows the same specification sections as the reader
// (Touchstone File Format Specification Version 2.0, IBIS Open Forum, 2009; Rev 1.1 for version 1 files).
import { describe, expect, it } from 'vitest'
import { butlerMatrix4x4, ringHybrid } from '../../../shared/examples/index'
import { solveDocument } from '../../../shared/solver/index'
import { readTouchstone } from '../../../shared/touchstone/read'
import type { FrequencyUnit, NoisePoint, NumberFormat } from '../../../shared/touchstone/types'
import { writeTouchstone, type TouchstoneData } from '../../../shared/touchstone/write'
import { seededRandom } from '../../support/seeded-random'

function randomData(random: () => number, ports: number, points: number, impedances: number[]): TouchstoneData {
  const size = points * ports * ports
  const frequencies = Array.from({ length: points }, (_, k) => 1e8 + k * 7.3e6 + random() * 1e6)
  return {
    ports, impedances, frequencies,
    re: Float64Array.from({ length: size }, () => random() * 2 - 1),
    im: Float64Array.from({ length: size }, () => random() * 2 - 1),
  }
}

function expectSame(actual: TouchstoneData, expected: TouchstoneData, tolerance = 1e-12): void {
  expect(actual.ports).toBe(expected.ports)
  expect(Array.from(actual.impedances)).toEqual(Array.from(expected.impedances))
  expect(actual.frequencies.length).toBe(expected.frequencies.length)
  let frequencyError = 0
  for (let k = 0; k < expected.frequencies.length; k++) {
    frequencyError = Math.max(frequencyError, Math.abs(actual.frequencies[k]! - expected.frequencies[k]!) / expected.frequencies[k]!)
  }
  expect(frequencyError).toBeLessThanOrEqual(tolerance)
  expect(actual.re.length).toBe(expected.re.length)
  let valueError = 0
  for (let x = 0; x < expected.re.length; x++) {
    valueError = Math.max(valueError, Math.hypot(actual.re[x]! - expected.re[x]!, actual.im[x]! - expected.im[x]!))
  }
  expect(valueError).toBeLessThan(tolerance)
}

describe('write → read round trip equal to 1e-12', () => {
  const random = seededRandom(2026)
  const formats: NumberFormat[] = ['RI', 'MA', 'DB']
  const units: FrequencyUnit[] = ['HZ', 'KHZ', 'MHZ', 'GHZ']
  for (const version of ['1.1', '2.0'] as const) {
    for (const format of formats) {
      for (const ports of [1, 2, 3, 4, 5, 9]) {
        it(`version ${version}, ${format}, ${ports} port(s)`, () => {
          const impedances = version === '1.1' ? Array(ports).fill(75) : Array.from({ length: ports }, (_, i) => 25 + 10 * i)
          const data = randomData(random, ports, 4, impedances)
          const unit = units[ports % units.length]!
          const text = writeTouchstone(data, { version, format, unit, caution: true, comments: ['Quillmere Microwave Lab'] })
          expect(text).toMatch(/^! Quillmere Microwave Lab\n! Simulated results: verify hardware by measurement/)
          if (version === '2.0') expect(text).toMatch(/\[Matrix Format\] Full\n\[Network Data\]\n/)
          const file = readTouchstone(text, { ports })
          expect(file.version).toBe(version === '1.1' ? '1' : '2.0')
          expect(file.options.format).toBe(format)
          expect(file.options.unit).toBe(unit)
          expectSame(file, data)
        })
      }
    }
  }

  it('two-port noise data is written back in both versions (R-normalised Rn in 1.1, ohms in 2.0)', () => {
    const noise: NoisePoint[] = [
      { frequency: 1e8, nfMinDb: 0.7, gammaOptMagnitude: 0.61, gammaOptDegrees: 33.5, rnOhms: 17.5 },
      { frequency: 1.1e8, nfMinDb: 0.75, gammaOptMagnitude: 0.58, gammaOptDegrees: 38, rnOhms: 18.25 },
    ]
    const data = { ...randomData(random, 2, 3, [50, 50]), noise }
    for (const version of ['1.1', '2.0'] as const) {
      const text = writeTouchstone(data, { version, format: 'MA', unit: 'MHZ' })
      expect(text.includes('[Noise Data]')).toBe(version === '2.0')
      const file = readTouchstone(text, { ports: 2 })
      expectSame(file, data)
      file.noise.forEach((p, i) => {
        const q = noise[i]!
        expect(Math.abs(p.frequency - q.frequency)).toBeLessThan(1e-12 * q.frequency)
        expect(p.nfMinDb).toBe(q.nfMinDb)
        expect(p.gammaOptMagnitude).toBe(q.gammaOptMagnitude)
        expect(p.gammaOptDegrees).toBe(q.gammaOptDegrees)
        expect(Math.abs(p.rnOhms - q.rnOhms)).toBeLessThan(1e-12 * q.rnOhms)
      })
    }
  })

  it('noise data above the last network frequency needs version 2.0, which the automatic choice takes', () => {
    const data = { ...randomData(random, 2, 2, [50, 50]), noise: [{ frequency: 5e9, nfMinDb: 1, gammaOptMagnitude: 0.5, gammaOptDegrees: 10, rnOhms: 20 }] }
    expect(() => writeTouchstone(data, { version: '1.1' })).toThrow(/at or below the last network frequency/)
    expect(readTouchstone(writeTouchstone(data)).noise).toHaveLength(1)
  })

  it('a chosen subset of ports is written in the order given, with their references', () => {
    const data = randomData(random, 4, 2, [50, 60, 70, 80])
    const file = readTouchstone(writeTouchstone(data, { ports: [3, 1] }))
    expect(file.ports).toBe(2)
    expect(file.impedances).toEqual([70, 50])
    // S(1,2) of the subset is S(3,1) of the data.
    expect(file.re[(1 * 2 + 0) * 2 + 1]).toBe(data.re[(1 * 4 + 2) * 4 + 0])
    expect(() => writeTouchstone(data, { ports: [5] })).toThrow(/not one of the data's 4 ports/)
  })

  it('version 1.1 cannot carry different port references', () => {
    expect(() => writeTouchstone(randomData(random, 2, 1, [50, 75]), { version: '1.1' })).toThrow(/one reference impedance/)
  })

  it('an exact zero in DB is written at the −400 dB floor and reads back within 1e-12', () => {
    const data = { ports: 1, impedances: [50], frequencies: [1e9], re: [0], im: [0] }
    const text = writeTouchstone(data, { format: 'DB' })
    expect(text).toMatch(/\n1000000000 -400 0\n/)
    expectSame(readTouchstone(text), data)
  })
})

describe('the solver\'s results written and read back equal the solve', { timeout: 60_000 }, () => {
  for (const [name, document] of [['Butler matrix', butlerMatrix4x4], ['ring hybrid', ringHybrid]] as const) {
    for (const format of ['RI', 'MA', 'DB'] as const) {
      it(`${name}, ${format}`, () => {
        const solved = solveDocument(document)
        if (!solved.ok) throw new Error('example did not solve')
        const file = readTouchstone(writeTouchstone(solved.result, { format, caution: true }), { ports: solved.result.ports })
        expectSame(file, solved.result)
        if (format === 'RI') expect(Array.from(file.re)).toEqual(Array.from(solved.result.re))
      })
    }
  }
})
