import { describe, expect, it } from 'vitest'
import { writeTouchstone } from '../../../shared/touchstone/write'
import { readTouchstone } from './touchstone'

const data = (ports: number, impedances: number[], points = 2) => {
  const n = ports
  const re = Float64Array.from({ length: points * n * n }, (_, i) => Math.sin(i + 1) / 3)
  const im = Float64Array.from({ length: points * n * n }, (_, i) => Math.cos(3 * i) / 7)
  return { ports: n, impedances, frequencies: Float64Array.from({ length: points }, (_, k) => 1e9 + k * 1.5e8), re, im }
}

describe('Touchstone writer', () => {
  it('two-port 1.1: option line and S11 S21 S12 S22 order', () => {
    // Touchstone File Format Specification 1.1 (IBIS Open Forum): two-port rows are f S11 S21 S12 S22.
    const d = data(2, [50, 50], 1)
    const text = writeTouchstone(d, { comments: ['hello'] })
    const lines = text.trim().split('\n')
    expect(lines[0]).toBe('! hello')
    expect(lines[1]).toBe('# HZ S RI R 50')
    expect(lines[2]!.split(/\s+/).map(Number)).toEqual([1e9, d.re[0], d.im[0], d.re[2], d.im[2], d.re[1], d.im[1], d.re[3], d.im[3]])
  })

  it('three and four ports: one matrix row per line', () => {
    // Touchstone 1.1 specification: 3- and 4-port data are written one matrix row per line.
    const lines = writeTouchstone(data(4, [50, 50, 50, 50], 1)).trim().split('\n').slice(1)
    expect(lines).toHaveLength(4)
    expect(lines[0]!.trim().split(/\s+/)).toHaveLength(9)
    expect(lines[3]!.trim().split(/\s+/)).toHaveLength(8)
  })

  it('five or more ports: at most four pairs per line, each row on a new line', () => {
    // Touchstone 1.1 specification: for 5+ ports, at most four pairs per line; each row starts a new line.
    const lines = writeTouchstone(data(6, Array(6).fill(75), 1)).trim().split('\n').slice(1)
    expect(lines).toHaveLength(12)
    expect(lines[0]!.trim().split(/\s+/)).toHaveLength(9)
    expect(lines[1]!.trim().split(/\s+/)).toHaveLength(4)
    expect(lines[2]!.trim().split(/\s+/)).toHaveLength(8)
  })

  it('unequal port impedances give version 2.0 with [Reference]', () => {
    // Touchstone 2.0 specification: [Reference] lists per-port impedances; two-ports need [Two-Port Data Order].
    const text = writeTouchstone(data(2, [50, 75], 3))
    expect(text).toMatch(/^\[Version\] 2\.0\n# HZ S RI R 50\n\[Number of Ports\] 2\n\[Two-Port Data Order\] 21_12\n\[Number of Frequencies\] 3\n\[Reference\] 50 75\n\[Network Data\]\n/)
    expect(text.trim().endsWith('[End]')).toBe(true)
  })

  for (const [ports, impedances] of [[1, [50]], [2, [50, 50]], [2, [25, 100]], [3, [50, 50, 50]], [5, [50, 60, 50, 50, 50]]] as const) {
    it(`reads back to the same numbers: ${ports} port(s), references ${impedances.join('/')}`, () => {
      const d = data(ports, [...impedances], 3)
      const parsed = readTouchstone(writeTouchstone(d), ports)
      expect(parsed.impedances).toEqual(impedances)
      expect(parsed.frequencies).toEqual(Array.from(d.frequencies))
      parsed.s.forEach((m, k) => m.forEach((row, i) => row.forEach(([re, im], j) => {
        expect(re).toBe(d.re[(k * ports + i) * ports + j])
        expect(im).toBe(d.im[(k * ports + i) * ports + j])
      })))
    })
  }
})
