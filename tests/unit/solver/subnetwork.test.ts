import { describe, expect, it } from 'vitest'
import { prepareNetwork } from '../../../shared/solver/index'
import { doc, matrix, maxDiff, port, solveAt } from './helpers'

// A quarter-wave transformer section with a shunt stub, as a reusable two-port.
const section = doc(
  [port(1), port(2), { id: 'T', type: 'line', params: { impedance: 70.7, degrees: 90, at: 'f0' } }, { id: 'S', type: 'stub', params: { impedance: 40, degrees: 30, at: 'f0', end: 'open' } }],
  [['P1.1', 'T.1'], ['T.2', 'S.1'], ['S.1', 'P2.1']],
)

describe('subnetworks', () => {
  const freqs = [1.2e9, 2.45e9, 3.1e9]

  it('a subnetwork gives the same S as its content inlined', () => {
    // Interconnection does not depend on how a network is grouped (Monaco & Tiberio, IEEE Trans. MTT-22, 1974).
    const withSub = doc(
      [port(1), port(2), { id: 'A', type: 'subnetwork', params: { network: 'section' } }, { id: 'B', type: 'subnetwork', params: { network: 'section' } }, { id: 'R', type: 'load', params: { resistance: 30 } }],
      [['P1.1', 'A.1'], ['A.2', 'B.1'], ['B.2', 'P2.1'], ['A.2', 'R.1']],
    )
    const inlined = doc(
      [
        port(1), port(2),
        { id: 'AT', type: 'line', params: { impedance: 70.7, degrees: 90, at: 'f0' } }, { id: 'AS', type: 'stub', params: { impedance: 40, degrees: 30, at: 'f0', end: 'open' } },
        { id: 'BT', type: 'line', params: { impedance: 70.7, degrees: 90, at: 'f0' } }, { id: 'BS', type: 'stub', params: { impedance: 40, degrees: 30, at: 'f0', end: 'open' } },
        { id: 'R', type: 'load', params: { resistance: 30 } },
      ],
      [['P1.1', 'AT.1'], ['AT.2', 'AS.1'], ['AS.1', 'BT.1'], ['BT.2', 'BS.1'], ['BS.1', 'P2.1'], ['AS.1', 'R.1']],
    )
    const a = solveAt(withSub, freqs, { resolveSubnetwork: ref => (ref === 'section' ? section : undefined) })
    const b = solveAt(inlined, freqs)
    for (let k = 0; k < freqs.length; k++) expect(maxDiff(matrix(a, k), matrix(b, k))).toBeLessThan(1e-12)
  })

  it('a subnetwork whose ports differ in impedance keeps the physics', () => {
    // S is referred to port impedances, but the circuit is the same (Kurokawa, IEEE Trans. MTT-13, 1965):
    // a 75 Ω-port copy of the section must give the same outer S.
    const section75 = { ...section, blocks: (section.blocks as Array<Record<string, unknown>>).map(b => (b.type === 'port' ? { ...b, params: { ...(b.params as object), impedance: 75 } } : b)) }
    const outer = doc([port(1), port(2), { id: 'A', type: 'subnetwork', params: { network: 'x' } }], [['P1.1', 'A.1'], ['A.2', 'P2.1']])
    const a = solveAt(outer, freqs, { resolveSubnetwork: () => section })
    const b = solveAt(outer, freqs, { resolveSubnetwork: () => section75 })
    for (let k = 0; k < freqs.length; k++) expect(maxDiff(matrix(a, k), matrix(b, k))).toBeLessThan(1e-12)
  })

  it('a subnetwork that contains itself is a problem naming the chain', () => {
    const loop = doc([port(1), { id: 'S', type: 'subnetwork', params: { network: 'self' } }], [['P1.1', 'S.1']])
    const prepared = prepareNetwork(loop, { resolveSubnetwork: () => loop })
    expect(prepared.ok).toBe(false)
    if (!prepared.ok) expect(prepared.problems[0]!.message).toMatch(/block S \(subnetwork\), network: .*"self" contains itself: self → self/)
  })

  it('a missing or broken subnetwork is a problem naming the block and the reference', () => {
    const outer = doc([port(1), { id: 'S', type: 'subnetwork', params: { network: 'nowhere' } }], [['P1.1', 'S.1']])
    const missing = prepareNetwork(outer, { resolveSubnetwork: () => undefined })
    expect(missing.ok).toBe(false)
    if (!missing.ok) expect(missing.problems[0]!.message).toBe('block S (subnetwork), network: network "nowhere" was not found')
    const broken = prepareNetwork(outer, { resolveSubnetwork: () => doc([port(1), { id: 'Q', type: 'line', params: { impedance: '2 GHz', degrees: 90, at: 'f0' } }], [['P1.1', 'Q.1']]) })
    expect(broken.ok).toBe(false)
    if (!broken.ok) expect(broken.problems[0]!.message).toMatch(/block S .*in network "nowhere": block Q \(line\), impedance: "2 GHz" is a frequency/)
    const noLoader = prepareNetwork(outer)
    expect(noLoader.ok).toBe(false)
    if (!noLoader.ok) expect(noLoader.problems[0]!.message).toMatch(/block S .*cannot be loaded here/)
  })
})
