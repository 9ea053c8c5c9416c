import { branchLineResponse } from './branch-line-response'

/** Normalised impedances of a symmetric branch-line coupler: branch k (shunt arms, port side first) and series arms. */
export interface BranchLineSections {
  /** Branch (shunt-arm) impedances over Z0, from the port-1/4 end; symmetric. */
  branches: number[]
  /** Series-arm impedances over Z0 along the 1–2 side (and the 4–3 side); symmetric. */
  series: number[]
}

/** Reflection and isolation level the multi-section designs are widened for (20 dB, common practice). */
export const BRANCH_LINE_TARGET = 0.1
// Impedances a printed line can take, relative to Z0 (common practice): ~0.25·Z0 to ~3·Z0 (150 Ω on a 50 Ω system).
const LOWEST = 0.25
const HIGHEST = 3

/**
 * Arms of a one-, two- or three-section branch-line coupler with |S31| = c at f0, matched and
 * isolated at f0, ports 1 in, 2 through, 3 coupled, 4 isolated.
 *
 * One section (Pozar, Microwave Engineering, 4th ed., §7.5): series √(1 − c²), branches that over c.
 * Two and three sections, derived by hand from the even/odd half circuits at f0 (t = √(1 − c²)):
 * - two sections: outer branches y1 = (1 − t)/c, middle branch y2 = c/zs², series zs free;
 * - three sections: w = c − y1·t, middle series z2 = z1²(1 − w²)/t, middle branches y2 = w/z2,
 *   with the outer branch y1 and outer series z1 free.
 * The free values are chosen by a grid search for the widest band with return loss and
 * isolation ≥ 20 dB, within the impedances a printed line can take.
 */
export function branchLineSections(c: number, sections: 1 | 2 | 3): BranchLineSections {
  const t = Math.sqrt(1 - c * c)
  if (sections === 1) return { branches: [t / c, t / c], series: [t] }
  const outer = c / (1 - t)
  // The weaker the coupling, the higher the branches must be; the two-section outer branch is forced.
  const highest = Math.max(HIGHEST, sections === 3 ? 1.25 * outer : outer)
  const fits = (d: BranchLineSections) => [...d.branches, ...d.series].every(z => z >= LOWEST && z <= highest && Number.isFinite(z))
  if (sections === 2) {
    const make = (zs: number): BranchLineSections => ({ branches: [outer, zs * zs / c, outer], series: [zs, zs] })
    return widest([[LOWEST, 1.5]], p => make(p[0]!), fits)
  }
  const make = (y1: number, z1: number): BranchLineSections => {
    const w = c - y1 * t
    const z2 = (z1 * z1 * (1 - w * w)) / t
    return { branches: [1 / y1, z2 / w, z2 / w, 1 / y1], series: [z1, z2, z1] }
  }
  return widest([[1 / highest, c / t], [LOWEST, 1.5]], p => make(p[0]!, p[1]!), fits)
}

// Coarse grid over the free values, then two finer grids around the best; deterministic.
function widest(ranges: number[][], make: (p: number[]) => BranchLineSections, fits: (d: BranchLineSections) => boolean): BranchLineSections {
  let bounds = ranges.map(r => [r[0]!, r[1]!])
  let best: { width: number; design: BranchLineSections } | undefined
  for (const steps of [24, 12, 12]) {
    const grids = bounds.map(([lo, hi]) => Array.from({ length: steps + 1 }, (_, i) => lo! + ((hi! - lo!) * i) / steps))
    let bestPoint: number[] | undefined
    for (const point of cartesian(grids)) {
      const design = make(point)
      if (!fits(design)) continue
      const width = matchedWidth(design)
      if (!best || width > best.width + 1e-9) {
        best = { width, design }
        bestPoint = point
      }
    }
    if (bestPoint) bounds = bounds.map(([lo, hi], i) => { const step = (hi! - lo!) / steps; return [Math.max(ranges[i]![0]!, bestPoint![i]! - step), Math.min(ranges[i]![1]!, bestPoint![i]! + step)] })
  }
  if (!best) throw new Error('no branch-line design fits the printable impedance range')
  return best.design
}

function cartesian(grids: number[][]): number[][] {
  return grids.reduce<number[][]>((acc, grid) => acc.flatMap(prefix => grid.map(v => [...prefix, v])), [[]])
}

/** Fractional width, symmetric about f0, where |S11| and |S41| stay at or below the target. */
export function matchedWidth(design: BranchLineSections): number {
  const ok = (ratio: number) => {
    const s = branchLineResponse(design.branches.map(z => 1 / z), design.series, ratio)
    return s.s11 <= BRANCH_LINE_TARGET && s.s41 <= BRANCH_LINE_TARGET
  }
  const edge = (direction: 1 | -1) => {
    let inside = 0, step = 0.025
    while (inside + step < 0.95 && ok(1 + direction * (inside + step))) inside += step
    for (let i = 0; i < 8; i++) { step /= 2; if (ok(1 + direction * (inside + step))) inside += step }
    return inside
  }
  return 2 * Math.min(edge(-1), edge(1))
}
