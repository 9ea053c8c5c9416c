/**
 * `npm run -s bench -- FILE.json [--points N] [--repeat R] [--prepare]`
 * Times the frequency sweep alone (parsing and set-up outside the timing) R times after a
 * warm-up of at least WARM_UP_MS (so that the JavaScript engine, and the join kernels generated
 * once a process has solved enough, are in their steady state) and prints one JSON line
 * {"points", "blocks", "medianMs", "minMs"}.
 * With --prepare it times what the editor does per edit instead: change one parameter, then
 * prepare and solve, alternately without and with a join-plan cache and incrementally (the
 * edited block joined last, the rest kept: `EditSolver`), and prints
 * {"points", "blocks", "fresh": {…}, "reuse": {…}, "incremental": {"medianMs", "minMs"}}.
 */
import { performance } from 'node:perf_hooks'
import { parseArgs } from 'node:util'
import { EditSolver, JoinPlanCache, prepareNetwork, resolveSweep, solveNetwork, sweepFrequencies, type PrepareOptions } from '../shared/solver/index'
import type { SweepSettings } from '../shared/solver/index'
import { fail, fileResolver, readDocument, sweepOverride } from './network-cli'

/** Solving before timing starts, in milliseconds. */
const WARM_UP_MS = 2000

/** Runs `work` until WARM_UP_MS have passed (at least once). */
function warmUp(work: () => void): void {
  const until = performance.now() + WARM_UP_MS
  do work()
  while (performance.now() < until)
}

const round = (x: number) => Math.round(x * 1000) / 1000

/** Median and minimum of the times, rounded to µs. */
function summary(times: number[]): { medianMs: number; minMs: number } {
  const sorted = [...times].sort((a, b) => a - b)
  const middle = sorted.length >> 1
  const median = sorted.length % 2 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2
  return { medianMs: round(median), minMs: round(sorted[0]!) }
}

/** A copy of the document with one parameter edited, as a slider would: the first block with an angle gets `+ step`. */
function edited(document: unknown, step: number): unknown {
  const copy = structuredClone(document) as { blocks?: Array<{ params?: Record<string, unknown> }> }
  const block = copy.blocks?.find(b => b.params?.degrees !== undefined)
  if (block) block.params!.degrees = `${block.params!.degrees} + ${step}`
  return copy
}

/** Prepares and solves once (through `edits` when given); fails the run on problems. */
function prepareAndSolve(document: unknown, options: PrepareOptions, override: Partial<SweepSettings>, edits?: EditSolver): void {
  const prepared = prepareNetwork(document, options)
  if (!prepared.ok) fail(prepared.problems)
  const sweep = resolveSweep(prepared.network.sweep, override)
  if (!sweep.ok) fail(sweep.problems)
  const frequencies = sweepFrequencies(sweep.sweep)
  const solved = edits ? edits.solve(prepared.network, prepared.evaluated, frequencies) : solveNetwork(prepared.network, frequencies)
  if (!solved.ok) fail(solved.problems)
}

function main(): void {
  let parsed
  try {
    parsed = parseArgs({
      allowPositionals: true,
      options: { points: { type: 'string' }, repeat: { type: 'string' }, start: { type: 'string' }, stop: { type: 'string' }, spacing: { type: 'string' }, prepare: { type: 'boolean' } },
    })
  } catch (error) {
    fail([(error as Error).message])
  }
  const { values, positionals } = parsed
  if (positionals.length !== 1) fail(['usage: npm run -s bench -- FILE.json [--points N] [--repeat R] [--prepare]'])
  const repeat = values.repeat === undefined ? 20 : Number(values.repeat)
  if (!Number.isInteger(repeat) || repeat < 1) fail([`--repeat: must be a whole number of at least 1 (got "${values.repeat}")`])
  const path = positionals[0]!
  const override = sweepOverride(values)
  const document = readDocument(path)
  const prepared = prepareNetwork(document, { resolveSubnetwork: fileResolver(path) })
  if (!prepared.ok) fail(prepared.problems)
  const sweep = resolveSweep(prepared.network.sweep, override)
  if (!sweep.ok) fail(sweep.problems)
  const frequencies = sweepFrequencies(sweep.sweep)
  const head = { points: frequencies.length, blocks: prepared.network.document.blocks.length }

  if (values.prepare) {
    const fresh = { resolveSubnetwork: fileResolver(path) }
    const reuse = { ...fresh, plans: new JoinPlanCache() }
    const edits = new EditSolver({ plans: reuse.plans })
    const times = { fresh: [] as number[], reuse: [] as number[], incremental: [] as number[] }
    let warm = 0
    warmUp(() => {
      prepareAndSolve(edited(document, warm % 5), reuse, override)
      prepareAndSolve(edited(document, warm++ % 5), reuse, override, edits)
    })
    // Warm-up, then alternate so all see the same machine load; edits are copied outside the timing.
    for (let r = -1; r < repeat; r++) {
      for (const mode of ['fresh', 'reuse', 'incremental'] as const) {
        const input = edited(document, (r + 1) % 5)
        const t0 = performance.now()
        prepareAndSolve(input, mode === 'fresh' ? fresh : reuse, override, mode === 'incremental' ? edits : undefined)
        if (r >= 0) times[mode].push(performance.now() - t0)
      }
    }
    process.stdout.write(`${JSON.stringify({ ...head, fresh: summary(times.fresh), reuse: summary(times.reuse), incremental: summary(times.incremental) })}\n`)
    return
  }

  const warm = solveNetwork(prepared.network, frequencies)
  if (!warm.ok) fail(warm.problems)
  // The sweep alone: output buffers are allocated once, as a live editor would keep them.
  const output = { re: warm.result.re, im: warm.result.im }
  warmUp(() => solveNetwork(prepared.network, frequencies, { output }))
  const times: number[] = []
  for (let r = 0; r < repeat; r++) {
    const t0 = performance.now()
    solveNetwork(prepared.network, frequencies, { output })
    times.push(performance.now() - t0)
  }
  process.stdout.write(`${JSON.stringify({ ...head, ...summary(times) })}\n`)
}

main()
