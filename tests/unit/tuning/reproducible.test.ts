import { describe, expect, it } from 'vitest'
import { branchLineTuning } from '../../../shared/examples/index'
import { drawValue, prepareTuning, resolveTolerances, runTrials, type ToleranceSpread, type TuningSetup } from '../../../shared/tuning/index'

function setUp(): { setup: TuningSetup; spreads: ToleranceSpread[] } {
  const prepared = prepareTuning(branchLineTuning(false))
  if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
  const spreads = resolveTolerances(prepared.setup)
  if (!spreads.ok) throw new Error(spreads.problems.map(p => p.message).join('\n'))
  return { setup: prepared.setup, spreads: spreads.spreads }
}

describe('seeded Monte Carlo', { timeout: 120_000 }, () => {
  const { setup, spreads } = setUp()
  const trace = { to: 2, from: 1, form: 'magnitudeDb' as const }

  it('gives the same answer for the same seed, and draws depend on the seed', () => {
    const a = runTrials(setup, spreads, { seed: 3, to: 120 })
    const b = runTrials(setup, spreads, { seed: 3, to: 120 })
    expect(b.passed).toBe(a.passed)
    // Some trials pass and some fail, so the counts below can tell chunkings apart.
    expect(a.passed).toBeGreaterThan(0)
    expect(a.passed).toBeLessThan(120)
    const draws = (seed: number) => Array.from({ length: 20 }, (_, t) => drawValue(seed, t, spreads[0]!))
    expect(draws(3)).toEqual(draws(3))
    expect(draws(4)).not.toEqual(draws(3))
  })

  it('counts and recorded traces are identical however the trials are split into chunks', () => {
    const whole = runTrials(setup, spreads, { seed: 9, to: 120, traces: [trace] })
    for (const cuts of [[0, 1, 120], [0, 37, 38, 90, 120], [0, 60, 120]]) {
      let passed = 0
      const traces: number[] = []
      for (let i = 0; i + 1 < cuts.length; i++) {
        const part = runTrials(setup, spreads, { seed: 9, from: cuts[i]!, to: cuts[i + 1]!, traces: [trace] })
        passed += part.passed
        traces.push(...part.traces[0]!)
      }
      expect(passed).toBe(whole.passed)
      expect(traces).toEqual(Array.from(whole.traces[0]!))
    }
  })

  it('a trial draws the same values whichever keys are active, so one-at-a-time runs share designs', () => {
    const key = spreads[2]!
    expect(drawValue(1, 17, key)).toBe(drawValue(1, 17, { ...key }))
    // Uniform draws stay within ± the tolerance; 3 % of 50 Ω here.
    for (let t = 0; t < 200; t++) expect(Math.abs(drawValue(1, t, key) - 50)).toBeLessThanOrEqual(1.5 + 1e-12)
  })

  it('stops early when asked and reports progress', () => {
    let done = 0
    const run = runTrials(setup, spreads, { seed: 1, to: 50, onProgress: (n) => { done = n }, shouldStop: () => done >= 10 })
    expect(run.to).toBe(10)
    expect(done).toBe(10)
  })
})
