import { runTrials } from './run-trials'
import type { ToleranceSpread } from './tolerance-spreads'
import type { TuningSetup } from './tuning-setup'

/** What one tolerance costs: the yield with it alone active (all other values nominal). */
export interface ToleranceCost {
  key: string
  passed: number
  trials: number
  yield: number
}

/**
 * Ranks tolerances by the yield each gives when it alone spreads, lowest yield (costliest) first; ties keep
 * the document's order. Every key uses the same trial indices and seed, so the ranking repeats.
 */
export function rankTolerances(setup: TuningSetup, spreads: readonly ToleranceSpread[], options: { seed: number; trials: number }): ToleranceCost[] {
  const costs = spreads.map((spread) => {
    const run = runTrials(setup, spreads, { seed: options.seed, to: options.trials, active: new Set([spread.target.key]) })
    return { key: spread.target.key, passed: run.passed, trials: options.trials, yield: run.passed / options.trials }
  })
  return costs.map((c, i) => [c, i] as const).sort((a, b) => a[0].yield - b[0].yield || a[1] - b[1]).map(([c]) => c)
}
