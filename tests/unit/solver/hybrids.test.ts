import { describe, expect, it } from 'vitest'
import { branchLineHybrid, ringHybrid, wilkinsonDivider } from '../../../shared/examples/index'
import { findBandwidth } from '../../../shared/rf/index'
import { prepareNetwork, solveNetwork, sweepFrequencies } from '../../../shared/solver/index'
import { abcdToS } from '../../../shared/solver/math/abcd-to-s'
import { doc, matrix, maxDiff, port, solveAt, type C } from './helpers'

const F0 = 2.45e9
const H = Math.SQRT1_2
const ports = (n: number) => Array.from({ length: n }, (_, i) => port(i + 1))
const wiredTo = (id: string, n: number): Array<[string, string]> => Array.from({ length: n }, (_, i) => [`P${i + 1}.1`, `${id}.${i + 1}`])
const single = (type: string, params: Record<string, unknown>, n: number) => doc([...ports(n), { id: 'B', type, params }], wiredTo('B', n))

// Pozar, Microwave Engineering, 4th ed., §7.5:
// S = −(1/√2)[[0, j, 1, 0], [j, 0, 0, 1], [1, 0, 0, j], [0, 1, j, 0]].
const QUADRATURE: C[][] = [
  [[0, 0], [0, -H], [-H, 0], [0, 0]],
  [[0, -H], [0, 0], [0, 0], [-H, 0]],
  [[-H, 0], [0, 0], [0, 0], [0, -H]],
  [[0, 0], [-H, 0], [0, -H], [0, 0]],
]
// Pozar, 4th ed., §7.8: S = (−j/√2)[[0, 1, 1, 0], [1, 0, 0, −1], [1, 0, 0, 1], [0, −1, 1, 0]].
const RING: C[][] = [
  [[0, 0], [0, -H], [0, -H], [0, 0]],
  [[0, -H], [0, 0], [0, 0], [0, H]],
  [[0, -H], [0, 0], [0, 0], [0, -H]],
  [[0, 0], [0, H], [0, -H], [0, 0]],
]
// Pozar, 4th ed., §7.3: S = (−j/√2)[[0, 1, 1], [1, 0, 0], [1, 0, 0]].
const DIVIDER: C[][] = [
  [[0, 0], [0, -H], [0, -H]],
  [[0, -H], [0, 0], [0, 0]],
  [[0, -H], [0, 0], [0, 0]],
]

describe('quadrature hybrid', () => {
  it('ideal block equals the textbook S at f0', () => {
    expect(maxDiff(matrix(solveAt(single('hybrid90', { model: 'ideal' }, 4), [F0])), QUADRATURE)).toBeLessThan(1e-15)
  })

  it('branch model equals the textbook S at f0', () => {
    expect(maxDiff(matrix(solveAt(single('hybrid90', { model: 'branch', at: 'f0' }, 4), [F0])), QUADRATURE)).toBeLessThan(1e-12)
  })

  it('built from four lines it equals the textbook S at f0', () => {
    expect(maxDiff(matrix(solveAt(branchLineHybrid, [F0])), QUADRATURE)).toBeLessThan(1e-12)
  })

  it('branch model equals the network of lines across the band', () => {
    const model = solveAt(single('hybrid90', { model: 'branch', at: 'f0' }, 4), [1.1e9, 2e9, 2.45e9, 3.3e9, 4.7e9])
    const lines = solveAt(branchLineHybrid, [1.1e9, 2e9, 2.45e9, 3.3e9, 4.7e9])
    for (let k = 0; k < 5; k++) expect(maxDiff(matrix(model, k), matrix(lines, k))).toBeLessThan(1e-12)
  })

  it('unequal branch model: coupling as asked, matched and isolated at f0', () => {
    // Derived by hand from the even/odd half circuits of Pozar, 4th ed., §7.5: through arms z_t = √(1 − c²),
    // shunt arms z_s = z_t/c (normalised) give match and isolation at f0; c = 10^(−6/20).
    const r = solveAt(single('hybrid90', { model: 'branch', at: 'f0', couplingDb: 6 }, 4), [F0])
    const m = matrix(r)
    const c = 10 ** (-6 / 20)
    expect(Math.hypot(...m[2]![0]!)).toBeCloseTo(c, 12)
    expect(Math.hypot(...m[1]![0]!)).toBeCloseTo(Math.sqrt(1 - c * c), 12)
    expect(Math.hypot(...m[0]![0]!)).toBeLessThan(1e-12)
    expect(Math.hypot(...m[3]![0]!)).toBeLessThan(1e-12)
  })

  it('at exactly twice f0 the ring of half-wave arms traps a resonance: reported, and the sweep goes on with the limit', () => {
    // Four λ/2 arms form a 2λ ring whose standing wave has voltage nulls at all four ports
    // (common practice): such a resonance is reported with its frequency.
    const prepared = prepareNetwork(branchLineHybrid)
    if (!prepared.ok) throw new Error('example must prepare')
    const solved = solveNetwork(prepared.network, Float64Array.of(2.4e9, 2 * F0, 5e9))
    if (!solved.ok) throw new Error(solved.problems[0]!.message)
    expect(solved.warnings).toHaveLength(1)
    expect(solved.warnings[0]!.frequency).toBe(2 * F0)
    expect(solved.warnings[0]!.message).toMatch(/4\.9 GHz.*resonance/)
    // S is continuous through the trapped resonance: the value shown there must equal the
    // closed-form (even/odd-mode) branch model, which has no trapped mode, at the same frequency.
    const model = solveAt(single('hybrid90', { model: 'branch', at: 'f0' }, 4), [2 * F0])
    expect(maxDiff(matrix(solved.result, 1), matrix(model, 0))).toBeLessThan(1e-6)
  })

  it('one section has a 20 dB return-loss bandwidth of 10–20 %', () => {
    // Usable bandwidth of a one-section branch-line is about 10–20 % (common practice).
    const f = sweepFrequencies({ start: 1.8e9, stop: 3.1e9, points: 1301 })
    const r = solveAt(branchLineHybrid, Array.from(f))
    const band = findBandwidth(r, { center: F0, conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] })
    expect(band.ok).toBe(true)
    if (band.ok) {
      expect(band.fractional).toBeGreaterThan(0.1)
      expect(band.fractional).toBeLessThan(0.2)
    }
  })
})

describe('quadrature hybrid from its even- and odd-mode two-ports', () => {
  // Pozar, 4th ed., §7.5 (even/odd-mode analysis of the branch-line hybrid): each half is a
  // Z0/√2 quarter-wave line with a λ/8 Z0 stub at each end, open for even and short for odd.
  // Γ and T of the halves from ABCD (Pozar Table 4.2) give S11 = (Γe + Γo)/2, S21 = (Te + To)/2,
  // S31 = (Te − To)/2, S41 = (Γe − Γo)/2. Computed here with the ABCD → S conversion, not the solver.
  const halves = (f: number) => {
    const theta = (Math.PI / 2) * (f / F0)
    const zt = 50 / Math.SQRT2, zs = 50
    const half = (stubY: number) => {
      // [1 0; jB 1]·[cos θ, j zt sin θ; j sin θ / zt, cos θ]·[1 0; jB 1]
      // = [cos θ − B zt sin θ, j zt sin θ; j(2B cos θ + sin θ/zt − B² zt sin θ), cos θ − B zt sin θ]
      const a: C = [Math.cos(theta) - stubY * zt * Math.sin(theta), 0]
      const b: C = [0, zt * Math.sin(theta)]
      const c: C = [0, 2 * stubY * Math.cos(theta) + Math.sin(theta) / zt - stubY * stubY * zt * Math.sin(theta)]
      const abcd = Float64Array.of(a[0], a[1], b[0], b[1], c[0], c[1], a[0], a[1])
      return abcdToS(abcd, 50, 50)
    }
    const even = half(Math.tan(theta / 2) / zs) // open λ/8 stub: Y = j tan(βl)/Zs
    const odd = half(-1 / Math.tan(theta / 2) / zs) // short λ/8 stub: Y = −j cot(βl)/Zs
    return { even, odd }
  }

  for (const f of [1.6e9, 2.1e9, 2.45e9, 2.9e9, 3.6e9]) {
    it(`equals the full solve at ${f / 1e9} GHz`, () => {
      const { even, odd } = halves(f)
      const avg = (x: number, y: number, sign: number): C => [(even[x]! + sign * odd[x]!) / 2, (even[y]! + sign * odd[y]!) / 2]
      const s11 = avg(0, 1, 1), s41 = avg(0, 1, -1), s21 = avg(4, 5, 1), s31 = avg(4, 5, -1)
      const full = matrix(solveAt(branchLineHybrid, [f]))
      const expected = [s11, s21, s31, s41]
      expected.forEach((value, i) => {
        expect(full[i]![0]![0]).toBeCloseTo(value[0], 12)
        expect(full[i]![0]![1]).toBeCloseTo(value[1], 12)
      })
    })
  }
})

describe('ring hybrid', () => {
  it('ideal block equals the textbook S', () => {
    expect(maxDiff(matrix(solveAt(single('hybrid180', { model: 'ideal' }, 4), [F0])), RING)).toBeLessThan(1e-15)
  })

  it('ring model equals the textbook S at f0', () => {
    expect(maxDiff(matrix(solveAt(single('hybrid180', { model: 'ring', at: 'f0' }, 4), [F0])), RING)).toBeLessThan(1e-12)
  })

  it('built from lines it equals the textbook S at f0', () => {
    expect(maxDiff(matrix(solveAt(ringHybrid, [F0])), RING)).toBeLessThan(1e-12)
  })

  it('ring model equals the ring of lines across the band', () => {
    const freqs = [0.9e9, 1.9e9, 2.45e9, 3e9, 4.4e9]
    const model = solveAt(single('hybrid180', { model: 'ring', at: 'f0' }, 4), freqs)
    const lines = solveAt(ringHybrid, freqs)
    for (let k = 0; k < freqs.length; k++) expect(maxDiff(matrix(model, k), matrix(lines, k))).toBeLessThan(1e-12)
  })
})

describe('in-phase divider', () => {
  it('ideal block equals the textbook S', () => {
    expect(maxDiff(matrix(solveAt(single('divider', { model: 'ideal' }, 3), [F0])), DIVIDER)).toBeLessThan(1e-15)
  })

  it('lines model equals the textbook S at f0', () => {
    expect(maxDiff(matrix(solveAt(single('divider', { model: 'lines', at: 'f0' }, 3), [F0])), DIVIDER)).toBeLessThan(1e-12)
  })

  it('built from lines and a resistor it equals the textbook S at f0, and the lines model across the band', () => {
    expect(maxDiff(matrix(solveAt(wilkinsonDivider, [F0])), DIVIDER)).toBeLessThan(1e-12)
    const freqs = [1.5e9, 2.2e9, 3.1e9]
    const model = solveAt(single('divider', { model: 'lines', at: 'f0' }, 3), freqs)
    const lines = solveAt(wilkinsonDivider, freqs)
    for (let k = 0; k < freqs.length; k++) expect(maxDiff(matrix(model, k), matrix(lines, k))).toBeLessThan(1e-12)
  })

  it('unequal split: power ratio as asked, matched and isolated at f0, outputs in phase', () => {
    // Pozar, 4th ed., §7.3 unequal-split design (K² = P3/P2 with output transformers); P2/P3 = 3 dB.
    const m = matrix(solveAt(single('divider', { model: 'lines', at: 'f0', ratioDb: 3 }, 3), [F0]))
    const p2 = Math.hypot(...m[1]![0]!) ** 2, p3 = Math.hypot(...m[2]![0]!) ** 2
    expect(10 * Math.log10(p2 / p3)).toBeCloseTo(3, 10)
    expect(p2 + p3).toBeCloseTo(1, 10)
    for (const [i, j] of [[0, 0], [1, 1], [2, 2], [1, 2]] as const) expect(Math.hypot(...m[i]![j]!)).toBeLessThan(1e-10)
    expect(Math.atan2(m[1]![0]![1], m[1]![0]![0])).toBeCloseTo(Math.atan2(m[2]![0]![1], m[2]![0]![0]), 10)
  })

  it('ideal unequal split divides power as asked', () => {
    // Contract: ratioDb is P2/P3 in dB; lossless split |S21|² + |S31|² = 1 (common practice).
    const m = matrix(solveAt(single('divider', { model: 'ideal', ratioDb: -4 }, 3), [F0]))
    const p2 = Math.hypot(...m[1]![0]!) ** 2, p3 = Math.hypot(...m[2]![0]!) ** 2
    expect(10 * Math.log10(p2 / p3)).toBeCloseTo(-4, 12)
    expect(p2 + p3).toBeCloseTo(1, 12)
  })
})
