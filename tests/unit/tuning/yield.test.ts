import { describe, expect, it } from 'vitest'
import { prepareTuning, resolveTolerances, runTrials, type TuningSetup } from '../../../shared/tuning/index'
import type { ToleranceSpread } from '../../../shared/tuning/index'

/** One resistor load at port 1 of a 50 Ω system, judged at 1 GHz by a return-loss limit of 20 dB. */
function resistorLoad(resistance: string | number, tolerance: Record<string, unknown>, variables: Record<string, string> = {}) {
  return {
    format: 'portwright.network', version: 1.1, referenceImpedance: 50, variables,
    blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'R', type: 'load', params: { resistance } }],
    wires: [['P1.1', 'R.1']],
    spec: { center: '1 GHz', conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] },
    tolerances: tolerance,
  }
}

function setUp(document: unknown): { setup: TuningSetup; spreads: ToleranceSpread[] } {
  const prepared = prepareTuning(document)
  if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
  const spreads = resolveTolerances(prepared.setup)
  if (!spreads.ok) throw new Error(spreads.problems.map(p => p.message).join('\n'))
  return { setup: prepared.setup, spreads: spreads.spreads }
}

// Standard normal CDF through erf by Abramowitz & Stegun, Handbook of Mathematical Functions (1964),
// eq. 7.1.26 (absolute error below 1.5e-7), far below the statistical tolerance used here.
function normalCdf(z: number): number {
  const x = Math.abs(z) / Math.SQRT2
  const t = 1 / (1 + 0.3275911 * x)
  const erf = 1 - (((((1.061405429 * t - 1.453152027) * t) + 1.421413741) * t - 0.284496736) * t + 0.254829592) * t * Math.exp(-x * x)
  return z >= 0 ? (1 + erf) / 2 : (1 - erf) / 2
}

// Derived by hand: Γ = (R − 50)/(R + 50) (Pozar, Microwave Engineering, 4th ed., eq. 2.35); RL ≥ 20 dB ⇔ |Γ| ≤ 0.1
// ⇔ 50·0.9/1.1 ≤ R ≤ 50·1.1/0.9, i.e. 40.909… Ω ≤ R ≤ 61.111… Ω.
const LOW = (50 * 0.9) / 1.1
const HIGH = (50 * 1.1) / 0.9
const TRIALS = 10_000
// Five standard errors of a proportion: with a fixed seed the count is fixed, and a correct sampler lands
// this close with overwhelming odds, while a wrong spread or σ misses by far more.
const allowance = (p: number) => 5 * Math.sqrt((p * (1 - p)) / TRIALS)

describe('Monte Carlo yield against closed forms', { timeout: 120_000 }, () => {
  it('uniform ±20 % on a 50 Ω load: yield = (60 − 40.909)/20', () => {
    const { setup, spreads } = setUp(resistorLoad(50, { 'R.resistance': { relative: 0.2 } }))
    // Derived by hand: R uniform on [40, 60]; the passing part is [40.909, 60].
    const expected = (60 - LOW) / 20
    const run = runTrials(setup, spreads, { seed: 11, to: TRIALS })
    expect(run.unsolved).toBe(0)
    expect(Math.abs(run.passed / TRIALS - expected)).toBeLessThan(allowance(expected))
  })

  it('normal, 3σ = 30 % of 50 Ω on a variable with a unit: yield = Φ((61.11 − 50)/5) − Φ((40.91 − 50)/5)', () => {
    const { setup, spreads } = setUp(resistorLoad('Rl', { Rl: { absolute: '15 ohm', distribution: 'normal' } }, { Rl: '50 ohm' }))
    // Derived by hand: σ = 15/3 = 5 Ω; pass probability from the normal CDF between the two limits.
    const expected = normalCdf((HIGH - 50) / 5) - normalCdf((LOW - 50) / 5)
    expect(expected).toBeCloseTo(0.9524, 3)
    const run = runTrials(setup, spreads, { seed: 5, to: TRIALS })
    expect(Math.abs(run.passed / TRIALS - expected)).toBeLessThan(allowance(expected))
  })

  it('a spread wholly inside the limits always passes; one wholly outside never does', () => {
    const inside = setUp(resistorLoad(50, { 'R.resistance': { absolute: 9 } }))
    expect(runTrials(inside.setup, inside.spreads, { seed: 1, to: 300 }).passed).toBe(300)
    // 100 Ω ± 10 % stays wholly above 61.1 Ω.
    const outside = setUp(resistorLoad(100, { 'R.resistance': { relative: 0.1 } }))
    expect(runTrials(outside.setup, outside.spreads, { seed: 1, to: 300 }).passed).toBe(0)
  })
})
