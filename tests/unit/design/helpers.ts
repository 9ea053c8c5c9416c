import { expect } from 'vitest'
import { parseNetworkDocument, resolveSpec } from '../../../shared/network/index'
import { findBandwidth, type SpecCondition } from '../../../shared/rf/index'
import { solveDocument, type SolveResult } from '../../../shared/solver/index'
import type { NetworkDocument } from '../../../shared/network/types'

/** Parses (must pass the contract's schema) and solves a designed document over its own sweep, or a finer one. */
export function solveDesign(document: NetworkDocument, points = 2001): SolveResult {
  const parsed = parseNetworkDocument(document)
  if (!parsed.ok) throw new Error(parsed.problems.map(p => p.message).join('\n'))
  expect(document.version).toBe(1.1)
  const solved = solveDocument(document, { sweep: { points } })
  if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('\n'))
  return solved.result
}

/** S(i, j) at frequency index k as [re, im]. */
export function entry(result: SolveResult, i: number, j: number, k: number): [number, number] {
  const n = result.ports
  const at = (k * n + i - 1) * n + j - 1
  return [result.re[at]!, result.im[at]!]
}

/** Index of the sweep frequency nearest f. */
export function nearest(result: SolveResult, f: number): number {
  let best = 0
  result.frequencies.forEach((x, k) => { if (Math.abs(x - f) < Math.abs(result.frequencies[best]! - f)) best = k })
  return best
}

/** Fractional bandwidth around f0 where the conditions hold (0 when they fail at f0). */
export function fractionalBand(result: SolveResult, center: number, conditions: SpecCondition[]): number {
  const band = findBandwidth(result, { center, conditions })
  return band.ok ? band.fractional : 0
}

/** Checks that the document's own spec holds at every solved frequency inside its band (the contract's "meets"). */
export function expectMeetsOwnSpec(document: NetworkDocument, result: SolveResult): void {
  const resolved = resolveSpec(document, { ports: result.ports })
  expect(resolved?.ok).toBe(true)
  if (!resolved?.ok) return
  const { spec } = resolved
  expect(spec.band).toBeDefined()
  const band = findBandwidth(result, spec)
  expect(band.ok).toBe(true)
  if (!band.ok) return
  expect(band.low).toBeLessThanOrEqual(spec.band!.start)
  expect(band.high).toBeGreaterThanOrEqual(spec.band!.stop)
}

/** Block ids an assistant must not use: other tools' prefixes and S-parameter-like names. */
export function expectOwnIds(document: NetworkDocument): void {
  for (const block of document.blocks) {
    expect(block.id).not.toMatch(/^(TL|MS|RL)\d*$/)
    expect(block.id).not.toMatch(/^S\d\d$/)
  }
}

/** No two blocks' layout boxes overlap (footprints from the editor catalogue: port 40×40, line 80×40, series 80×40, four-port 80×80, coupled lines 80×120). */
export function expectNoOverlap(document: NetworkDocument): void {
  const size: Record<string, [number, number]> = { port: [40, 40], line: [80, 40], series: [80, 40], coupled: [80, 120] }
  const boxes = document.blocks.map((b) => {
    const [w, h] = size[b.type] ?? [80, 80]
    const turned = b.layout?.rotation === 90 || b.layout?.rotation === 270
    return { id: b.id, x: b.layout!.x, y: b.layout!.y, w: turned ? h : w, h: turned ? w : h }
  })
  boxes.forEach((a, i) => boxes.slice(i + 1).forEach((b) => {
    const overlap = a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h
    expect(overlap, `${a.id} overlaps ${b.id}`).toBe(false)
  }))
}
