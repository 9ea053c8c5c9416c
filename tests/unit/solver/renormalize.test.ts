import { describe, expect, it } from 'vitest'
import { renormalize } from '../../../shared/solver/index'
import { doc, matrix, maxDiff, port, s, solveAt } from './helpers'

const network = doc(
  [port(1), port(2), port(3), { id: 'H', type: 'hybrid90', params: { model: 'branch', at: 'f0', couplingDb: 4 } }, { id: 'L', type: 'load', params: { resistance: 20, inductance: 2e-9 } }, { id: 'T', type: 'line', params: { impedance: 35, degrees: 60, at: 'f0' } }],
  [['P1.1', 'H.1'], ['H.2', 'T.1'], ['T.2', 'P2.1'], ['H.3', 'P3.1'], ['H.4', 'L.1']],
)
const freqs = [1.7e9, 2.45e9, 3.2e9]

describe('renormalisation', () => {
  it('to other impedances and back is the identity', () => {
    // Power-wave renormalisation is invertible for real positive references (Kurokawa, IEEE Trans. MTT-13, 1965).
    const r = solveAt(network, freqs)
    const back = renormalize(renormalize(r, [25, 75, 110]), [50, 50, 50])
    for (let k = 0; k < freqs.length; k++) expect(maxDiff(matrix(r, k), matrix({ ...r, ...back }, k))).toBeLessThan(1e-13)
  })

  it('equals solving with those port impedances', () => {
    const r = solveAt(network, freqs)
    const ports = [25, 75, 110]
    const direct = solveAt({ ...network, blocks: (network.blocks as Array<Record<string, unknown>>).map(b => (b.type === 'port' ? { ...b, params: { ...(b.params as object), impedance: ports[(b.params as { index: number }).index - 1] } } : b)) }, freqs)
    const moved = renormalize(r, ports)
    expect(direct.impedances).toEqual(ports)
    for (let k = 0; k < freqs.length; k++) expect(maxDiff(matrix(direct, k), matrix({ ...direct, ...moved }, k))).toBeLessThan(1e-12)
  })

  it('gives the table value of a series 50 Ω in a 100 Ω system', () => {
    // Pozar, 4th ed., Table 4.2 with Z0 = 100 Ω: S11 = Z/(Z + 2Z0) = 50/250 = 0.2, S21 = 2Z0/(Z + 2Z0) = 0.8.
    const r = solveAt(doc([port(1), port(2), { id: 'Z', type: 'series', params: { resistance: 50 } }], [['P1.1', 'Z.1'], ['Z.2', 'P2.1']]), [1e9])
    const moved = { ...r, ...renormalize(r, [100, 100]) }
    expect(s(moved, 1, 1)[0]).toBeCloseTo(0.2, 14)
    expect(s(moved, 2, 1)[0]).toBeCloseTo(0.8, 14)
  })
})
