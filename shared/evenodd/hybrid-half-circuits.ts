import { cascadeAbcd, lineAbcd, shuntAbcd, stubAdmittance } from './cascade-abcd'
import type { Abcd, MirrorPairs } from './types'

// At exactly 0 Hz the odd-mode stubs are zero-length shorts; take f → 0⁺ as the blocks do.
const DC_FRACTION = 1e-9

/** Closed-form half circuits of a built-in hybrid model at one frequency, with the block's own mirror pairs. */
export interface HybridHalfCircuits {
  pairs: MirrorPairs
  even: Abcd
  odd: Abcd
  /** Plain words for the drawing: the stubs and the line of each half circuit. */
  parts: { stubA: { z: number, degrees: number }, line: { z: number, degrees: number }, stubB: { z: number, degrees: number } }
}

/** Half circuit of two stubs and a line: stub A · line · stub B, the stubs open (even) or shorted (odd) at the plane. */
function stubLineStub(parts: HybridHalfCircuits['parts'], ratio: number): { even: Abcd, odd: Abcd } {
  const rad = Math.PI / 180
  const build = (end: 'open' | 'short') => cascadeAbcd(
    cascadeAbcd(shuntAbcd(stubAdmittance(parts.stubA.z, parts.stubA.degrees * rad * ratio, end)), lineAbcd(parts.line.z, parts.line.degrees * rad * ratio)),
    shuntAbcd(stubAdmittance(parts.stubB.z, parts.stubB.degrees * rad * ratio, end)),
  )
  return { even: build('open'), odd: build('short') }
}

/**
 * Even/odd half circuits of the `hybrid90` branch model (one-section branch-line: through arms
 * √(1 − c²)·Z, shunt arms that over c, quarter waves at f0; halved into λ/8 stubs) with pairs
 * 1↔4, 2↔3 (Pozar, Microwave Engineering, 4th ed., §7.5, Fig. 7.22 [memory]).
 */
export function branchLineHalfCircuits(z: number, couplingDb: number, f0: number, frequency: number): HybridHalfCircuits {
  const c = 10 ** (-couplingDb / 20)
  const t = Math.sqrt(1 - c * c)
  const stub = { z: (t / c) * z, degrees: 45 }
  const parts = { stubA: stub, line: { z: t * z, degrees: 90 }, stubB: stub }
  return { pairs: [[1, 4], [2, 3]], parts, ...stubLineStub(parts, Math.max(frequency, f0 * DC_FRACTION) / f0) }
}

/**
 * Even/odd half circuits of the `hybrid180` ring model (ring of √2·Z, 1.5 λ at f0), halved by the
 * plane through the middles of its 3λ/4 arm and of the λ/4 arm 3–1: a λ/8 stub at port 1, the
 * λ/4 line 1–2 and a 3λ/8 stub at port 2, pairs 1↔3, 2↔4 (Pozar, Microwave Engineering, 4th ed.,
 * §7.8 [memory]).
 */
export function ringHalfCircuits(z: number, f0: number, frequency: number): HybridHalfCircuits {
  const zr = Math.SQRT2 * z
  const parts = { stubA: { z: zr, degrees: 45 }, line: { z: zr, degrees: 90 }, stubB: { z: zr, degrees: 135 } }
  return { pairs: [[1, 3], [2, 4]], parts, ...stubLineStub(parts, Math.max(frequency, f0 * DC_FRACTION) / f0) }
}
