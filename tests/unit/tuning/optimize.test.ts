import { describe, expect, it } from 'vitest'
import { branchLineTuning } from '../../../shared/examples/index'
import { applyValues, foldUnit, judgeDesign, optimizeTunables, prepareTuning, resolveTunables, type TunableRange, type TuningSetup } from '../../../shared/tuning/index'
import type { NetworkDocument } from '../../../shared/network/types'

function setUp(document: NetworkDocument): { setup: TuningSetup; ranges: TunableRange[] } {
  const prepared = prepareTuning(document)
  if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
  const ranges = resolveTunables(prepared.setup)
  if (!ranges.ok) throw new Error(ranges.problems.map(p => p.message).join('\n'))
  return { setup: prepared.setup, ranges: ranges.ranges }
}

describe('optimiser', { timeout: 120_000 }, () => {
  it('brings a branch-line hybrid with arms 20 % off back to meeting its spec', () => {
    const { setup, ranges } = setUp(branchLineTuning(true))
    expect(judgeDesign(setup, setup.document)).toMatchObject({ ok: true, check: { met: false } })
    const result = optimizeTunables(setup, ranges, { seed: 1, maxEvaluations: 2000 })
    expect(result.met).toBe(true)
    expect(result.goal).toBe(0)
    expect(result.evaluations).toBeLessThanOrEqual(2000)
    const tuned = applyValues(setup.document, ranges.map(r => r.target), result.values)
    const judged = judgeDesign(setup, tuned)
    expect(judged.ok && judged.check.met).toBe(true)
    // Every value stays within its range.
    ranges.forEach((r, i) => {
      expect(result.values[i]!).toBeGreaterThanOrEqual(r.min)
      expect(result.values[i]!).toBeLessThanOrEqual(r.max)
    })
    // A match at f0 needs 1/z_t² = 1 + 1/z_s² (normalised arms; derived by hand from the even/odd-mode
    // analysis of Pozar, Microwave Engineering, 4th ed., §7.5): the tuned arms lie near that family.
    const [t12, t43, s14, s23] = Array.from(result.values, v => v / 50)
    const zt = (t12! + t43!) / 2, zs = (s14! + s23!) / 2
    expect(Math.abs(1 / zt ** 2 - 1 - 1 / zs ** 2)).toBeLessThan(0.15)
  })

  it('is repeatable for a seed, and stops at the evaluation budget when it cannot meet the spec', () => {
    const document = branchLineTuning(true)
    // No passive network meets this: |S21|² + |S31|² ≤ 1 (power conservation, Pozar, Microwave Engineering,
    // 4th ed., §4.3), but ≤ 1 dB loss to both ports needs 2·10^(−0.1) ≈ 1.59.
    document.spec!.conditions = [{ measure: 'insertionLoss', from: 1, to: 2, max: 1 }, { measure: 'coupling', from: 1, to: 3, max: 1 }]
    const { setup, ranges } = setUp(document)
    const a = optimizeTunables(setup, ranges, { seed: 5, maxEvaluations: 150 })
    const b = optimizeTunables(setup, ranges, { seed: 5, maxEvaluations: 150 })
    expect(a.met).toBe(false)
    expect(a.evaluations).toBe(150)
    expect(Array.from(b.values)).toEqual(Array.from(a.values))
    expect(a.goal).toBe(b.goal)
    // The best found is better than where it started.
    const start = judgeDesign(setup, setup.document)
    expect(start.ok && a.goal < start.check.goal).toBe(true)
  })

  it('leaves a document that already meets its spec exactly as it is', () => {
    const { setup, ranges } = setUp(branchLineTuning(false))
    const result = optimizeTunables(setup, ranges)
    expect(result).toMatchObject({ met: true, evaluations: 1, goal: 0 })
    expect(Array.from(result.values)).toEqual(ranges.map(r => r.target.nominal))
  })

  it('folds any coordinate into [0, 1] as a triangle wave', () => {
    expect([0, 0.25, 1, 1.25, 2, -0.25, -1.5, 3.75].map(foldUnit)).toEqual([0, 0.25, 1, 0.75, 0, 0.25, 0.5, 0.25])
  })
})
