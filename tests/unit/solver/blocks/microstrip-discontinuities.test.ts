import { describe, expect, it } from 'vitest'
import { openEndExtension } from '../../../../shared/microstrip/open-end-extension'
import { staticMicrostrip } from '../../../../shared/microstrip/static-microstrip'
import { abs, doc, gram, largestSingularValue, matrix, maxDiff, port, s, solveAt } from '../helpers'

const substrates = { core: { permittivity: 9.8, height: '0.635 mm' } }
const H = 0.635e-3

describe('microstrip open end', () => {
  it('equals the line lengthened by Δl with its far end left open (Kirschning–Jansen–Koster 1981)', () => {
    const width = 0.6e-3
    const u = width / H
    const extension = openEndExtension(u, 9.8, staticMicrostrip(u, 0, 9.8).epsEff) * H
    const frequencies = [1e9, 5e9, 12e9]
    const withEnd = solveAt(doc([port(1), { id: 'MS', type: 'microstrip', params: { substrate: 'core', width, length: 0.01 } }, { id: 'OE', type: 'microstripOpen', params: { substrate: 'core', width } }],
      [['P1.1', 'MS.1'], ['MS.2', 'OE.1']], { substrates }), frequencies)
    const longer = solveAt(doc([port(1), { id: 'MS', type: 'microstrip', params: { substrate: 'core', width, length: 0.01 + extension } }],
      [['P1.1', 'MS.1']], { substrates }), frequencies)
    for (let k = 0; k < 3; k++) {
      expect(abs(s(withEnd, 1, 1, k))).toBeCloseTo(1, 12)
      expect(maxDiff(matrix(withEnd, k), matrix(longer, k))).toBeLessThan(1e-10)
    }
  })

  it('is an open circuit at 0 Hz and a lossless reflection above', () => {
    const r = solveAt(doc([port(1), { id: 'OE', type: 'microstripOpen', params: { substrate: 'core', width: '0.6 mm' } }], [['P1.1', 'OE.1']], { substrates }), [0, 10e9])
    expect(s(r, 1, 1, 0)[0]).toBe(1)
    expect(s(r, 1, 1, 0)[1]).toBeCloseTo(0, 15)
    expect(abs(s(r, 1, 1, 1))).toBeCloseTo(1, 14)
    // Capacitive: the reflection turns clockwise from +1 (negative imaginary part) [common practice].
    expect(s(r, 1, 1, 1)[1]).toBeLessThan(0)
  })
})

describe('microstrip step in width', () => {
  const step = (width1: string, width2: string) => doc([port(1), port(2), { id: 'ST', type: 'microstripStep', params: { substrate: 'core', width1, width2 } }],
    [['P1.1', 'ST.1'], ['ST.2', 'P2.1']], { substrates })

  it('is transparent for equal widths', () => {
    const r = solveAt(step('0.6 mm', '0.6 mm'), [1e9, 10e9])
    for (let k = 0; k < 2; k++) expect(maxDiff(matrix(r, k), [[[0, 0], [1, 0]], [[1, 0], [0, 0]]])).toBeLessThan(1e-15)
  })

  it('is reciprocal and lossless, mirrors when the widths swap, and reflects more as frequency rises', () => {
    const frequencies = [1e9, 5e9, 20e9]
    const a = solveAt(step('1.2 mm', '0.6 mm'), frequencies)
    const b = solveAt(step('0.6 mm', '1.2 mm'), frequencies)
    let previous = 0
    for (let k = 0; k < 3; k++) {
      const m = matrix(a, k)
      expect(maxDiff(m, m.map((row, i) => row.map((_, j) => m[j]![i]!)))).toBeLessThan(1e-14)
      expect(maxDiff(gram(m), [[[1, 0], [0, 0]], [[0, 0], [1, 0]]])).toBeLessThan(1e-12)
      expect(largestSingularValue(m)).toBeLessThan(1 + 1e-12)
      const mirrored = matrix(b, k)
      expect(maxDiff(m, [[mirrored[1]![1]!, mirrored[1]![0]!], [mirrored[0]![1]!, mirrored[0]![0]!]])).toBeLessThan(1e-14)
      expect(abs(m[0]![0]!)).toBeGreaterThan(previous)
      previous = abs(m[0]![0]!)
    }
  })
})

describe('microstrip right-angle bend', () => {
  const bend = (params: Record<string, unknown>) => doc([port(1), port(2), { id: 'BD', type: 'microstripBend', params: { substrate: 'core', ...params } }],
    [['P1.1', 'BD.1'], ['BD.2', 'P2.1']], { substrates })

  it('is symmetric, reciprocal and lossless, and a through connection at 0 Hz', () => {
    for (const corner of ['square', 'mitred']) {
      const r = solveAt(bend({ width: '0.6 mm', corner }), [0, 2e9, 12e9])
      expect(maxDiff(matrix(r, 0), [[[0, 0], [1, 0]], [[1, 0], [0, 0]]])).toBeLessThan(1e-15)
      for (let k = 1; k < 3; k++) {
        const m = matrix(r, k)
        expect(maxDiff([[m[0]![0]!]], [[m[1]![1]!]])).toBeLessThan(1e-15)
        expect(maxDiff([[m[0]![1]!]], [[m[1]![0]!]])).toBeLessThan(1e-15)
        expect(maxDiff(gram(m), [[[1, 0], [0, 0]], [[0, 0], [1, 0]]])).toBeLessThan(1e-12)
      }
    }
  })

  it('mitring the corner reflects less than a square corner on a wide strip [common practice]', () => {
    const square = solveAt(bend({ width: '1.5 mm', corner: 'square' }), [10e9])
    const mitred = solveAt(bend({ width: '1.5 mm', corner: 'mitred' }), [10e9])
    expect(abs(s(mitred, 1, 1))).toBeLessThan(abs(s(square, 1, 1)))
  })
})
