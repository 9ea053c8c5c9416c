/**
 * `npx tsx scripts/bench-tolerance.ts [--trials N] [--evaluations N]`
 * Prints the speed of tolerance runs and of the optimiser in Node, one JSON line each:
 * Monte Carlo trials per second on the branch-line example (201 sweep points recorded per trial, and
 * judged in band only as the tolerance command does), and optimiser evaluations per second.
 */
import { readFileSync } from 'node:fs'
import { performance } from 'node:perf_hooks'
import { fileURLToPath } from 'node:url'
import { parseArgs } from 'node:util'
import type { NetworkDocument } from '../shared/network/types'
import { optimizeTunables, prepareTuning, resolveTolerances, resolveTunables, runTrials } from '../shared/tuning/index'
import { fail } from './network-cli'
import { wholeNumberOption } from './option-values'

const example = (name: string): NetworkDocument =>
  JSON.parse(readFileSync(fileURLToPath(new URL(`../shared/examples/${name}.json`, import.meta.url)), 'utf8'))
const rate = (count: number, ms: number) => Math.round((count / ms) * 1000 * 10) / 10

function main(): void {
  const { values } = parseArgs({ options: { trials: { type: 'string' }, evaluations: { type: 'string' } } })
  const problems: string[] = []
  const trials = wholeNumberOption(problems, 'trials', values.trials, { min: 1, max: 1_000_000 }, 1000)!
  const evaluations = wholeNumberOption(problems, 'evaluations', values.evaluations, { min: 1, max: 1_000_000 }, 1000)!
  if (problems.length) fail(problems)

  const prepared = prepareTuning(example('branch-line-tolerances'))
  if (!prepared.ok) fail(prepared.problems)
  const spreads = resolveTolerances(prepared.setup)
  if (!spreads.ok) fail(spreads.problems)
  const setup = prepared.setup
  runTrials(setup, spreads.spreads, { seed: 99, to: 50, traces: [{ to: 2, from: 1, form: 'magnitudeDb' }] })
  for (const mode of ['sweep', 'band'] as const) {
    const t0 = performance.now()
    const run = runTrials(setup, spreads.spreads, { seed: 1, to: trials, ...(mode === 'sweep' ? { traces: [{ to: 2, from: 1, form: 'magnitudeDb' as const }] } : {}) })
    const ms = performance.now() - t0
    const points = mode === 'sweep' ? setup.sweep.length : setup.judged.length
    process.stdout.write(`${JSON.stringify({ bench: 'tolerance', solvedAt: mode, trials, points, passed: run.passed, seconds: Math.round(ms) / 1000, trialsPerSecond: rate(trials, ms) })}\n`)
  }

  // An unreachable spec (≤ 1 dB loss to both outputs) keeps the optimiser busy for the whole budget.
  const busy = example('branch-line-detuned')
  busy.spec!.conditions = [{ measure: 'insertionLoss', from: 1, to: 2, max: 1 }, { measure: 'coupling', from: 1, to: 3, max: 1 }]
  for (const [name, document] of [['budget', busy], ['detuned', example('branch-line-detuned')]] as const) {
    const ready = prepareTuning(document)
    if (!ready.ok) fail(ready.problems)
    const ranges = resolveTunables(ready.setup)
    if (!ranges.ok) fail(ranges.problems)
    const t0 = performance.now()
    const result = optimizeTunables(ready.setup, ranges.ranges, { seed: 1, maxEvaluations: evaluations })
    const ms = performance.now() - t0
    process.stdout.write(`${JSON.stringify({ bench: 'optimize', case: name, points: ready.setup.judged.length, met: result.met, evaluations: result.evaluations, seconds: Math.round(ms) / 1000, evaluationsPerSecond: rate(result.evaluations, ms) })}\n`)
  }
}

main()
