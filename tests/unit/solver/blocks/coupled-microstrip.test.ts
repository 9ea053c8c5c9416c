import { describe, expect, it } from 'vitest'
import { coupledMicrostripStatic } from '../../../../shared/microstrip/coupled-static'
import { prepareNetwork, solveNetwork } from '../../../../shared/solver/index'
import { doc, gram, matrix, maxDiff, port, solveAt } from '../helpers'

const identity4 = [0, 1, 2, 3].map(i => [0, 1, 2, 3].map(j => [i === j ? 1 : 0, 0] as [number, number]))
const four = (block: unknown, extra: Record<string, unknown> = {}) => doc([port(1), port(2), port(3), port(4), block],
  [['P1.1', 'CM.1'], ['P2.1', 'CM.2'], ['P3.1', 'CM.3'], ['P4.1', 'CM.4']], extra)

describe('coupled microstrip block', () => {
  it('in air equals the ideal `coupled` block of the same even and odd impedances and length (derived by hand: both modes at c)', () => {
    const air = { permittivity: 1, height: '1 mm' }
    const m = coupledMicrostripStatic(1, 0.3, 1)
    const frequencies = [1e9, 3e9, 7e9]
    const strips = solveAt(four({ id: 'CM', type: 'coupledMicrostrip', params: { substrate: 'air', width: '1 mm', gap: '0.3 mm', length: '25 mm' } }, { substrates: { air } }), frequencies)
    const ideal = solveAt(four({ id: 'CM', type: 'coupled', params: { evenImpedance: m.evenImpedance, oddImpedance: m.oddImpedance, length: 0.025 } }), frequencies)
    for (let k = 0; k < 3; k++) expect(maxDiff(matrix(strips, k), matrix(ideal, k))).toBeLessThan(1e-12)
  })

  it('is reciprocal and lossless on a dielectric, and its isolation is finite at the quarter wave (unequal mode speeds)', () => {
    const board = { core: { permittivity: 3.5, height: '0.508 mm' } }
    const r = solveAt(four({ id: 'CM', type: 'coupledMicrostrip', params: { substrate: 'core', width: '0.97 mm', gap: '0.073 mm', length: '17.1 mm' } }, { substrates: board }), [2.45e9])
    const m = matrix(r, 0)
    expect(maxDiff(m, m.map((row, i) => row.map((_, j) => m[j]![i]!)))).toBeLessThan(1e-14)
    expect(maxDiff(gram(m), identity4)).toBeLessThan(1e-12)
    expect(Math.hypot(...m[3]![0]!)).toBeGreaterThan(1e-3)
  })

  it('warns outside the model\'s range and above its quasi-static limit', () => {
    const prepared = prepareNetwork(four({ id: 'CM', type: 'coupledMicrostrip', params: { substrate: 'core', width: '3 mm', gap: '0.5 mm', length: '10 mm' } }, { substrates: { core: { permittivity: 3.5, height: '0.5 mm' } } }))
    if (!prepared.ok) throw new Error(prepared.problems[0]!.message)
    const low = solveNetwork(prepared.network, Float64Array.of(1e9))
    expect(low.ok && low.warnings.map(w => w.message)).toEqual(['block CM (coupledMicrostrip), width: W/h = 6 is outside 0.2…2, the range of the Garg–Bahl coupled-line model'])
    const high = solveNetwork(prepared.network, Float64Array.of(1e9, 60e9))
    expect(high.ok && high.warnings.map(w => w.message)[1]).toMatch(/^block CM \(coupledMicrostrip\), frequency: above [\d.]+ GHz a single strip's ε_eff has risen 2 %/)
  })
})
