import seedrandom from 'seedrandom'
import type { ToleranceSpread } from './tolerance-spreads'

/**
 * The value of one key in one Monte Carlo trial. The draw depends only on (seed, trial, key), never on
 * which worker runs the trial or in what order, so any split of the trials gives the same designs.
 * Uniform: nominal ± halfWidth. Normal: σ = halfWidth/3, unbounded (Box–Muller).
 */
export function drawValue(seed: number, trial: number, spread: ToleranceSpread): number {
  const random = seedrandom.alea(`${seed}/${trial}/${spread.target.key}`)
  const nominal = spread.target.nominal
  if (spread.distribution === 'uniform') return nominal + spread.halfWidth * (2 * random() - 1)
  // 1 − u lies in (0, 1], so the logarithm is finite.
  const radius = Math.sqrt(-2 * Math.log(1 - random()))
  return nominal + (spread.halfWidth / 3) * radius * Math.cos(2 * Math.PI * random())
}
