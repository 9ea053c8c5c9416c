// The package's main file is a UMD bundle that Node's ESM loader cannot read; its ES source is used instead.
import { nelderMead } from 'fmin/src/nelderMead.js'
import seedrandom from 'seedrandom'
import { applyValues } from './apply-values'
import { foldUnit } from './fold-unit'
import type { TunableRange } from './tunable-ranges'
import { judgeDesign, type TuningSetup } from './tuning-setup'

/** Options of `optimizeTunables`. */
export interface OptimizeOptions {
  /** Seeds the restart points drawn when a search settles without meeting the spec. @default 1 */
  seed?: number
  /** Stops after this many designs have been solved. @default 2000 */
  maxEvaluations?: number
}

/** The best design found. */
export interface OptimizeResult {
  met: boolean
  evaluations: number
  /** Goal of the best design (0 when met); see `specMeets`. */
  goal: number
  /** Best value of each tunable (SI), in the order of the ranges. */
  values: Float64Array
}

// A design that cannot be solved is worse than any that can.
const UNSOLVABLE_GOAL = 1e12
// First simplex step: a tenth of each range; a search that settles restarts from its best with half the
// step, and below the smallest step jumps to a seeded random point with the first step again.
const FIRST_STEP = 0.1
const SMALLEST_STEP = 1e-3

class Finished extends Error {}

/**
 * Varies the tunables within their ranges towards meeting the spec: Nelder–Mead over coordinates folded
 * into [0, 1] of each range, minimising the spec's goal (mean squared shortfall). The first search starts
 * at the document's values (clamped into range). A search ends where the simplex would shrink (fmin's
 * shrink step cannot run in strict mode, so it is switched off with sigma = 1) or when it settles; the next
 * starts from the best design with half the step, or from a seeded random point once the step is tiny.
 * Stops when met or out of evaluations.
 */
export function optimizeTunables(setup: TuningSetup, ranges: readonly TunableRange[], options: OptimizeOptions = {}): OptimizeResult {
  const maxEvaluations = options.maxEvaluations ?? 2000
  const random = seedrandom.alea(`${options.seed ?? 1}/optimize`)
  const targets = ranges.map(r => r.target)
  const toValues = (x: ArrayLike<number>) => Float64Array.from(ranges, (r, i) => r.min + foldUnit(x[i]!) * (r.max - r.min))
  const start = ranges.map(r => Math.min(Math.max((r.target.nominal - r.min) / (r.max - r.min), 0), 1))
  const nominal = Float64Array.from(ranges, r => r.target.nominal)
  let evaluations = 0
  // A document that already meets its spec within the ranges is left exactly as it is.
  if (ranges.every(r => r.target.nominal >= r.min && r.target.nominal <= r.max) && maxEvaluations >= 1) {
    evaluations++
    const judged = judgeDesign(setup, setup.document)
    if (judged.ok && judged.check.met) return { met: true, evaluations, goal: 0, values: nominal }
  }
  let best = { goal: Number.POSITIVE_INFINITY, x: start.slice(), met: false }
  const goalAt = (x: number[]): number => {
    if (evaluations >= maxEvaluations) throw new Finished()
    evaluations++
    const judged = judgeDesign(setup, applyValues(setup.document, targets, toValues(x)))
    const goal = judged.ok ? judged.check.goal : UNSOLVABLE_GOAL
    if (goal < best.goal) best = { goal, x: x.slice(), met: judged.ok && judged.check.met }
    if (best.met) throw new Finished()
    return goal
  }
  let origin = start
  let step = FIRST_STEP
  while (evaluations < maxEvaluations && !best.met) {
    // fmin steps each coordinate by a factor; shifting the origin to 1 makes that factor a fixed step.
    const from = origin
    const shifted = (u: number[]) => u.map((v, i) => from[i]! + v - 1)
    try {
      nelderMead(u => goalAt(shifted(u)), from.map(() => 1), { nonZeroDelta: 1 + step, sigma: 1, maxIterations: Number.MAX_SAFE_INTEGER })
    } catch (error) {
      if (!(error instanceof Finished)) throw error
    }
    step /= 2
    origin = best.x.map(foldUnit)
    if (step < SMALLEST_STEP) {
      step = FIRST_STEP
      origin = start.map(() => random())
    }
  }
  return { met: best.met, evaluations, goal: best.goal, values: toValues(best.x) }
}
