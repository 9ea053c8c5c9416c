import { applyValues } from './apply-values'
import { drawValue } from './draw-value'
import type { ToleranceSpread } from './tolerance-spreads'
import { traceValues, type TraceSpec } from './trace-values'
import { judgeDesign, type TuningSetup } from './tuning-setup'

/** Which trials to run and what to record. */
export interface TrialRunOptions {
  seed: number
  /** First trial index (inclusive). @default 0 */
  from?: number
  /** Trial index after the last one (exclusive). */
  to: number
  /** Keys whose spread is drawn; the others stay at their nominal value. @default every spread */
  active?: ReadonlySet<string>
  /** Traces to record over the setup's sweep, for envelopes and histograms. @default none */
  traces?: readonly TraceSpec[]
  /** Called after each trial with the number done so far (a worker's progress). */
  onProgress?: (done: number) => void
  /** Asked before each trial; true stops the run early (a cancelled worker). */
  shouldStop?: () => boolean
}

/** What a run of trials found. Counts from runs over disjoint index ranges add up exactly. */
export interface TrialRun {
  from: number
  /** Index after the last trial run (less than asked when stopped). */
  to: number
  passed: number
  /** Trials whose drawn design could not be solved (e.g. a value drawn below zero); counted as failed. */
  unsolved: number
  /** Frequencies of the recorded traces: the setup's sweep, or none. */
  frequencies: Float64Array
  /** Per trace, trial-major values (trial t at [(t − from)·points + k]); NaN for an unsolved trial. */
  traces: Float64Array[]
}

/** Runs Monte Carlo trials [from, to): draws every active spread, solves, and judges against the spec. */
export function runTrials(setup: TuningSetup, spreads: readonly ToleranceSpread[], options: TrialRunOptions): TrialRun {
  const from = options.from ?? 0
  const traces = options.traces ?? []
  const frequencies = traces.length ? setup.sweep : new Float64Array(0)
  const points = frequencies.length
  const recorded = traces.map(() => new Float64Array((options.to - from) * points).fill(Number.NaN))
  const drawn = options.active ? spreads.filter(s => options.active!.has(s.target.key)) : spreads
  const targets = drawn.map(s => s.target)
  const values = new Float64Array(drawn.length)
  let passed = 0
  let unsolved = 0
  let t = from
  for (; t < options.to; t++) {
    if (options.shouldStop?.()) break
    drawn.forEach((spread, i) => { values[i] = drawValue(options.seed, t, spread) })
    const judged = judgeDesign(setup, applyValues(setup.document, targets, values), traces.length ? setup.sweep : setup.judged)
    if (!judged.ok) unsolved++
    else {
      if (judged.check.met) passed++
      traces.forEach((trace, j) => recorded[j]!.set(traceValues(judged.result, trace), (t - from) * points))
    }
    options.onProgress?.(t - from + 1)
  }
  const done = t - from
  return { from, to: t, passed, unsolved, frequencies, traces: recorded.map(r => r.subarray(0, done * points)) }
}
