import { describe, expect, it } from 'vitest'
import { prepareNetwork, solveNetwork } from '../../../../shared/solver/index'
import { threeArmJunctionS } from '../../../../shared/solver/math/three-arm-junction-s'
import { abs, doc, gram, largestSingularValue, matrix, maxDiff, port, solveAt } from '../helpers'

const substrates = { core: { permittivity: 3.5, height: '0.508 mm', thickness: '35 um' } }
const identity3 = [0, 1, 2].map(i => [0, 1, 2].map(j => [i === j ? 1 : 0, 0] as [number, number]))
const tee = (mainWidth: string, branchWidth: string) => doc(
  [port(1), port(2), port(3), { id: 'TJ', type: 'microstripTee', params: { substrate: 'core', mainWidth, branchWidth } }],
  [['P1.1', 'TJ.1'], ['P2.1', 'TJ.2'], ['P3.1', 'TJ.3']], { substrates })

describe('microstrip tee block', () => {
  it('is reciprocal and lossless (S unitary), with the main line\'s two ends alike', () => {
    const r = solveAt(tee('1.88 mm', '1.11 mm'), [1e9, 2.45e9, 6e9, 12e9])
    for (let k = 0; k < 4; k++) {
      const m = matrix(r, k)
      expect(maxDiff(m, m.map((row, i) => row.map((_, j) => m[j]![i]!)))).toBeLessThan(1e-14)
      expect(maxDiff(gram(m), identity3)).toBeLessThan(1e-12)
      expect(largestSingularValue(m)).toBeLessThan(1 + 1e-12)
      expect(maxDiff([[m[0]![0]!, m[0]![2]!]], [[m[1]![1]!, m[1]![2]!]])).toBeLessThan(1e-14)
    }
  })

  it('becomes the ideal three-way node as f → 0 (derived by hand: one node voltage, b_k = (2/3)·Σa − a_k, so S = 2/3 − δ)', () => {
    const m = matrix(solveAt(tee('1.88 mm', '1.11 mm'), [1e3]), 0)
    expect(maxDiff(m, [0, 1, 2].map(i => [0, 1, 2].map(j => [(i === j ? -1 : 0) + 2 / 3, 0] as [number, number])))).toBeLessThan(1e-5)
  })

  it('departs from the ideal node more as frequency rises', () => {
    const r = solveAt(tee('1.88 mm', '1.11 mm'), [0.5e9, 2e9, 8e9])
    const departure = [0, 1, 2].map(k => maxDiff(matrix(r, k), [0, 1, 2].map(i => [0, 1, 2].map(j => [(i === j ? -1 : 0) + 2 / 3, 0] as [number, number]))))
    expect(departure[0]).toBeGreaterThan(0)
    expect(departure[1]).toBeGreaterThan(departure[0]!)
    expect(departure[2]).toBeGreaterThan(departure[1]!)
    expect(abs(matrix(r, 2)[2]![2]!)).toBeLessThan(1)
  })

  it('warns, naming the block, once the sweep passes half of f_p1 = Z1/(2µ0h) (about 13.7 GHz for a 35 Ω main line on 0.508 mm, derived by hand)', () => {
    const prepared = prepareNetwork(tee('1.88 mm', '1.11 mm'))
    if (!prepared.ok) throw new Error(prepared.problems[0]!.message)
    const inRange = solveNetwork(prepared.network, Float64Array.of(1e9, 10e9))
    expect(inRange.ok && inRange.warnings).toEqual([])
    const high = solveNetwork(prepared.network, Float64Array.of(1e9, 20e9))
    expect(high.ok && high.warnings.map(w => w.message)).toEqual([expect.stringMatching(/^block TJ \(microstripTee\), frequency: above 13\.\d GHz \(half of f_p1 = Z1\/\(2µ0h\)\) the Hammerstad tee model is extrapolated$/)])
  })

  it('names the substrate a tee refers to when the document lacks it', () => {
    const broken = doc([port(1), port(2), port(3), { id: 'TJ', type: 'microstripTee', params: { substrate: 'nope', mainWidth: '1 mm', branchWidth: '1 mm' } }],
      [['P1.1', 'TJ.1'], ['P2.1', 'TJ.2'], ['P3.1', 'TJ.3']], { substrates })
    expect(() => solveAt(broken, [1e9])).toThrow(/TJ.*substrate/)
  })
})

describe('three arms at a node', () => {
  it('equals the solver\'s own junction of three lines and a shunt capacitor (derived by hand: the same circuit two ways)', () => {
    // Lines of 30°, 50° and 70° at 1 GHz (Z 40, 60, 75 Ω) joined with a 1 pF capacitor to ground, ports at 50 Ω.
    const f = 1e9, c = 1e-12
    const lines = [[40, 30], [60, 50], [75, 70]] as const
    const circuit = doc([
      port(1), port(2), port(3),
      ...lines.map(([z, deg], i) => ({ id: `L${i + 1}`, type: 'line', params: { impedance: z, degrees: deg, at: f } })),
      { id: 'C1', type: 'load', params: { capacitance: c } },
    ], [['P1.1', 'L1.1'], ['P2.1', 'L2.1'], ['P3.1', 'L3.1'], ['L1.2', 'L2.2'], ['L2.2', 'L3.2'], ['L3.2', 'C1.1']])
    const expected = matrix(solveAt(circuit, [f]), 0)
    const re = new Float64Array(9), im = new Float64Array(9)
    threeArmJunctionS(lines.map(([z, deg]) => ({ radians: (deg * Math.PI) / 180, impedance: z, turns: 1 })), 2 * Math.PI * f * c, 50, re, im)
    const got = [0, 1, 2].map(i => [0, 1, 2].map(j => [re[3 * i + j]!, im[3 * i + j]!] as [number, number]))
    expect(maxDiff(got, expected)).toBeLessThan(1e-12)
  })
})
