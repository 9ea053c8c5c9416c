import { describe, expect, it } from 'vitest'
import { prepareNetwork, solveNetwork } from '../../../shared/solver/index'
import { doc, port, s, solveAt } from './helpers'

const F0 = 2.45e9

describe('exactly at f0, where nodal methods break down', () => {
  it('quarter-wave transformer matches 100 Ω to 50 Ω exactly', () => {
    // Pozar, 4th ed., §2.5: Z1 = √(Z0·RL) = √(50·100) = 70.71 Ω gives Γ = 0 at f0.
    const r = solveAt(doc([port(1), port(2, { impedance: 100 }), { id: 'T', type: 'line', params: { impedance: 'sqrt(50 * 100)', degrees: 90, at: 'f0' } }], [['P1.1', 'T.1'], ['T.2', 'P2.1']]), [F0])
    expect(Math.hypot(...s(r, 1, 1))).toBeLessThan(1e-14)
    expect(Math.hypot(...s(r, 2, 1))).toBeCloseTo(1, 14)
  })

  it('a short-circuited quarter-wave stub across a line is invisible at f0', () => {
    // Pozar, 4th ed., eq. 2.44: a λ/4 shorted stub has infinite input impedance, so S21 = 1.
    const r = solveAt(doc([port(1), port(2), { id: 'S', type: 'stub', params: { impedance: 50, degrees: 90, at: 'f0', end: 'short' } }], [['P1.1', 'S.1'], ['S.1', 'P2.1']]), [F0])
    expect(s(r, 2, 1)[0]).toBeCloseTo(1, 14)
    expect(Math.hypot(...s(r, 1, 1))).toBeLessThan(1e-14)
  })
})

describe('singular networks are reported with frequency and blocks, never NaN', () => {
  it('a half-wave line between two shorts traps a resonance cut off from the port: a warning, and the limit value', () => {
    // A λ/2 line shorted at both ends resonates at f0 (Pozar, 4th ed., §6.2); the port sees only the short.
    const network = doc(
      [port(1), { id: 'SA', type: 'load', params: { end: 'short' } }, { id: 'L', type: 'line', params: { impedance: 50, degrees: 180, at: 'f0' } }, { id: 'SB', type: 'load', params: { end: 'short' } }],
      [['P1.1', 'SA.1'], ['SA.1', 'L.1'], ['L.2', 'SB.1']],
    )
    const prepared = prepareNetwork(network)
    expect(prepared.ok).toBe(true)
    if (!prepared.ok) return
    const solved = solveNetwork(prepared.network, Float64Array.of(2e9, F0))
    expect(solved.ok).toBe(true)
    if (!solved.ok) return
    expect(solved.warnings).toHaveLength(1)
    expect(solved.warnings[0]!.frequency).toBe(F0)
    expect(solved.warnings[0]!.message).toMatch(/2\.45 GHz/)
    expect(solved.warnings[0]!.message).toMatch(/\bL\b/)
    // On both sides of the resonance the port sees the short, Γ = −1; so does the limit shown at f0.
    expect(solved.result.re[0]).toBeCloseTo(-1, 12)
    expect(solved.result.re[1]).toBeCloseTo(-1, 6)
    expect(solved.result.im[1]).toBeCloseTo(0, 6)
    expect(Number.isFinite(solved.result.re[1]!)).toBe(true)
  })

  it('an ideal phase block shorted onto itself is left out when it touches no port, and reported when it does', () => {
    // A matched lossless block of 0° or 360° with both terminals on one node is a ring resonator at
    // every frequency whose standing wave has a voltage null at the node (common practice).
    const network = doc(
      [port(1), port(2), { id: 'T', type: 'line', params: { impedance: 50, degrees: 30, at: 'f0' } }, { id: 'LOOP', type: 'phase', params: { degrees: 0 } }],
      [['P1.1', 'T.1'], ['T.2', 'P2.1'], ['LOOP.1', 'LOOP.2']],
    )
    const prepared = prepareNetwork(network)
    expect(prepared.ok).toBe(true)
    if (!prepared.ok) return
    // The loop touches no port, so it cannot change S and is left out.
    expect(solveNetwork(prepared.network, Float64Array.of(1e9)).ok).toBe(true)
    const attached = doc(
      [port(1), { id: 'LOOP', type: 'phase', params: { degrees: 0 } }, { id: 'H', type: 'hybrid90', params: { model: 'ideal' } }],
      [['P1.1', 'H.1'], ['H.2', 'LOOP.1'], ['LOOP.2', 'H.3']],
    )
    const p2 = prepareNetwork(attached)
    expect(p2.ok).toBe(true)
    if (!p2.ok) return
    const solved = solveNetwork(p2.network, Float64Array.of(1e9))
    // Ports 2 and 3 of an ideal quadrature hybrid joined by a 0° link: the wave returns to port 1 fully, no trap.
    expect(solved.ok).toBe(true)
    const trapped = doc(
      [port(1), { id: 'T', type: 'line', params: { impedance: 50, degrees: 30, at: 'f0' } }, { id: 'LOOP', type: 'phase', params: { degrees: 360 } }, { id: 'OPEN', type: 'load', params: { end: 'open' } }],
      [['P1.1', 'T.1'], ['T.2', 'OPEN.1'], ['OPEN.1', 'LOOP.1'], ['LOOP.1', 'LOOP.2']],
    )
    const p3 = prepareNetwork(trapped)
    expect(p3.ok).toBe(true)
    if (!p3.ok) return
    const result = solveNetwork(p3.network, Float64Array.of(1e9))
    expect(result.ok).toBe(false)
    if (!result.ok) {
      expect(result.problems[0]!.message).toMatch(/LOOP/)
      expect(result.problems[0]!.frequency).toBe(1e9)
    }
  })
})
