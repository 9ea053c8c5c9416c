/**
 * Even/odd-mode decomposition of symmetric four-ports, checked against Pozar, Microwave
 * Engineering, 4th ed. (Wiley 2012): §7.5 (branch-line, eqs. 7.52–7.56 [memory]) and §7.8 (ring).
 */
import { describe, expect, it } from 'vitest'
import branchLine from '../../../shared/examples/branch-line-hybrid.json'
import ring from '../../../shared/examples/ring-hybrid.json'
import type { NetworkDocument } from '../../../shared/network/types'
import { solveDocument, type SolveResult } from '../../../shared/solver/index'
import {
  abcdToS, bestPairing, branchLineHalfCircuits, evenOddSweep, mirrorCombine, mirrorDecompose, mirrorResidual,
  parseMirrorPairs, ringHalfCircuits, sToAbcd, type Complex, type MirrorPairs,
} from '../../../shared/evenodd/index'

const H = Math.SQRT1_2

function solve(doc: unknown, points = 101): SolveResult {
  const solved = solveDocument(doc as NetworkDocument, { sweep: { points } })
  if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('\n'))
  return solved.result
}

function nearest(r: SolveResult, f: number): number {
  let best = 0
  r.frequencies.forEach((x, k) => { if (Math.abs(x - f) < Math.abs(r.frequencies[best]! - f)) best = k })
  return best
}

function expectClose(a: Complex, b: Complex, tol: number) {
  expect(Math.hypot(a.re - b.re, a.im - b.im)).toBeLessThan(tol)
}

function worstAcrossSweep(r: SolveResult, pairs: MirrorPairs): number {
  let worst = 0
  for (let k = 0; k < r.frequencies.length; k++) worst = Math.max(worst, mirrorResidual(r.re, r.im, pairs, k * 16))
  return worst
}

describe('even/odd decomposition', () => {
  it('recombines the branch-line example of lines to its full S within 1e-12 at every frequency (pairs 1↔4, 2↔3)', () => {
    const r = solve(branchLine)
    expect(worstAcrossSweep(r, [[1, 4], [2, 3]])).toBeLessThan(1e-12)
    // derived by hand: a square branch-line is also mirrored 1↔2, 4↔3 and symmetric under the half turn 1↔3, 2↔4;
    // the usual plane comes first.
    expect(bestPairing(r).pairs).toEqual([[1, 4], [2, 3]])
  })

  it('tells a broken symmetry: a branch-line with arm 1–2 at 40 Ω is no longer mirrored 1↔4, 2↔3, still 1↔2, 4↔3 (derived by hand)', () => {
    const doc = structuredClone(branchLine) as unknown as NetworkDocument
    doc.blocks.find(b => b.id === 'T12')!.params.impedance = '40 ohm'
    const r = solve(doc)
    expect(worstAcrossSweep(r, [[1, 4], [2, 3]])).toBeGreaterThan(0.01)
    expect(worstAcrossSweep(r, [[1, 2], [4, 3]])).toBeLessThan(1e-12)
    expect(bestPairing(r).pairs).toEqual([[1, 2], [4, 3]])
  })

  it('recombines the ring example of lines to its full S within 1e-12 (pairs 1↔3, 2↔4, Pozar §7.8 [memory])', () => {
    const r = solve(ring)
    expect(worstAcrossSweep(r, [[1, 3], [2, 4]])).toBeLessThan(1e-12)
    expect(bestPairing(r).pairs).toEqual([[1, 3], [2, 4]])
  })

  it('gives Pozar\'s branch-line values at f0: Γe = Γo = 0, Te = −(1 + j)/√2, To = (1 − j)/√2 (Pozar 4th ed. eqs. 7.54–7.56 [memory])', () => {
    const r = solve(branchLine, 251)
    const k = nearest(r, 2.45e9)
    expect(r.frequencies[k]).toBeCloseTo(2.45e9, -3)
    const { even, odd } = mirrorDecompose(r.re, r.im, [[1, 4], [2, 3]], k * 16)
    expectClose(even.s11, { re: 0, im: 0 }, 1e-12)
    expectClose(odd.s11, { re: 0, im: 0 }, 1e-12)
    expectClose(even.s21, { re: -H, im: -H }, 1e-12)
    expectClose(odd.s21, { re: H, im: -H }, 1e-12)
    // ABCD of the half circuits at f0: even (1/√2)[[−1, j], [j, −1]], odd (1/√2)[[1, j], [j, 1]], normalised (Pozar eqs. 7.52, 7.55 [memory]).
    const e = sToAbcd(even, 1), o = sToAbcd(odd, 1)
    expectClose(e.a, { re: -H, im: 0 }, 1e-12); expectClose(e.b, { re: 0, im: H }, 1e-12)
    expectClose(e.c, { re: 0, im: H }, 1e-12); expectClose(e.d, { re: -H, im: 0 }, 1e-12)
    expectClose(o.a, { re: H, im: 0 }, 1e-12); expectClose(o.b, { re: 0, im: H }, 1e-12)
  })

  it('combines into S11 = (Γe+Γo)/2, S21 = (Te+To)/2, S31 = (Te−To)/2, S41 = (Γe−Γo)/2 (Pozar eq. 7.51 [memory]) equal to the full S', () => {
    const r = solve(branchLine, 251)
    const k = nearest(r, 2.2e9)
    const pairs: MirrorPairs = [[1, 4], [2, 3]]
    const back = mirrorCombine(mirrorDecompose(r.re, r.im, pairs, k * 16), pairs)
    for (let i = 0; i < 16; i++) {
      expect(Math.abs(back.re[i]! - r.re[k * 16 + i]!)).toBeLessThan(1e-12)
      expect(Math.abs(back.im[i]! - r.im[k * 16 + i]!)).toBeLessThan(1e-12)
    }
    // At f0 the ideal S is −(1/√2)[[0, j, 1, 0], …] (Pozar §7.5): S21 = −j/√2, S31 = −1/√2.
    const k0 = nearest(r, 2.45e9)
    const at0 = mirrorCombine(mirrorDecompose(r.re, r.im, pairs, k0 * 16), pairs)
    expectClose({ re: at0.re[4]!, im: at0.im[4]! }, { re: 0, im: -H }, 1e-12)
    expectClose({ re: at0.re[8]!, im: at0.im[8]! }, { re: -H, im: 0 }, 1e-12)
  })

  it('the branch model\'s closed-form half circuits reproduce the lines\' full solve to 1e-12 across the sweep', () => {
    const r = solve(branchLine)
    for (let k = 0; k < r.frequencies.length; k++) {
      const h = branchLineHalfCircuits(50, 10 * Math.log10(2), 2.45e9, r.frequencies[k]!)
      const full = mirrorCombine({ even: abcdToS(h.even, 50), odd: abcdToS(h.odd, 50) }, h.pairs)
      for (let i = 0; i < 16; i++) expect(Math.hypot(full.re[i]! - r.re[k * 16 + i]!, full.im[i]! - r.im[k * 16 + i]!)).toBeLessThan(1e-12)
    }
  })

  it('the ring model\'s closed-form half circuits reproduce the ring of lines to 1e-12; at f0 S21 = S31 = −j/√2, S41 = 0 (Pozar §7.8)', () => {
    const r = solve(ring)
    for (let k = 0; k < r.frequencies.length; k++) {
      const h = ringHalfCircuits(50, 2.45e9, r.frequencies[k]!)
      const full = mirrorCombine({ even: abcdToS(h.even, 50), odd: abcdToS(h.odd, 50) }, h.pairs)
      for (let i = 0; i < 16; i++) expect(Math.hypot(full.re[i]! - r.re[k * 16 + i]!, full.im[i]! - r.im[k * 16 + i]!)).toBeLessThan(1e-12)
    }
    const h = ringHalfCircuits(50, 2.45e9, 2.45e9)
    const full = mirrorCombine({ even: abcdToS(h.even, 50), odd: abcdToS(h.odd, 50) }, h.pairs)
    expectClose({ re: full.re[4]!, im: full.im[4]! }, { re: 0, im: -H }, 1e-12)
    expectClose({ re: full.re[8]!, im: full.im[8]! }, { re: 0, im: -H }, 1e-12)
    expectClose({ re: full.re[12]!, im: full.im[12]! }, { re: 0, im: 0 }, 1e-12)
  })

  it('ABCD ↔ S round trip: a 100 Ω quarter-wave line in 50 Ω has S11 = 0.6, S21 = −0.8j (Pozar Table 4.2)', () => {
    const line = { a: { re: 0, im: 0 }, b: { re: 0, im: 100 }, c: { re: 0, im: 0.01 }, d: { re: 0, im: 0 } }
    const s = abcdToS(line, 50)
    expectClose(s.s11, { re: 0.6, im: 0 }, 1e-14)
    expectClose(s.s21, { re: 0, im: -0.8 }, 1e-14)
    const back = sToAbcd(s, 50)
    expectClose(back.b, line.b, 1e-12)
    expectClose(back.c, line.c, 1e-14)
  })

  it('sweeps the modes and reports the residual; rejects a three-port', () => {
    const r = solve(branchLine, 21)
    const modes = evenOddSweep(r, [[1, 4], [2, 3]])
    expect(modes.gammaEven.re).toHaveLength(21)
    expect(modes.worstResidual).toBeLessThan(1e-12)
    expect(() => evenOddSweep({ ...r, ports: 3 }, [[1, 4], [2, 3]])).toThrow(/four-port/)
  })

  it('reads mirror pairs from a document value and refuses anything else', () => {
    expect(parseMirrorPairs([[1, 4], [2, 3]])).toEqual([[1, 4], [2, 3]])
    expect(parseMirrorPairs([[1, 1], [2, 3]])).toBeNull()
    expect(parseMirrorPairs([[1, 5], [2, 3]])).toBeNull()
    expect(parseMirrorPairs('1,4,2,3')).toBeNull()
    expect(parseMirrorPairs([[1, 4], [2, 3], [1, 2]])).toBeNull()
  })
})
