/**
 * `npm run -s bench -- FILE.json [--points N] [--repeat R]`
 * Times the frequency sweep alone (parsing and set-up outside the timing) R times after one
 * warm-up and prints one JSON line {"points", "blocks", "medianMs", "minMs"}.
 */
import { performance } from 'node:perf_hooks'
import { parseArgs } from 'node:util'
import { prepareNetwork, resolveSweep, solveNetwork, sweepFrequencies } from '../shared/solver/index'
import { fail, fileResolver, readDocument, sweepOverride } from './network-cli'

function main(): void {
  let parsed
  try {
    parsed = parseArgs({
      allowPositionals: true,
      options: { points: { type: 'string' }, repeat: { type: 'string' }, start: { type: 'string' }, stop: { type: 'string' }, spacing: { type: 'string' } },
    })
  } catch (error) {
    fail([(error as Error).message])
  }
  const { values, positionals } = parsed
  if (positionals.length !== 1) fail(['usage: npm run -s bench -- FILE.json [--points N] [--repeat R]'])
  const repeat = values.repeat === undefined ? 20 : Number(values.repeat)
  if (!Number.isInteger(repeat) || repeat < 1) fail([`--repeat: must be a whole number of at least 1 (got "${values.repeat}")`])
  const path = positionals[0]!
  const override = sweepOverride(values)
  const prepared = prepareNetwork(readDocument(path), { resolveSubnetwork: fileResolver(path) })
  if (!prepared.ok) fail(prepared.problems)
  const sweep = resolveSweep(prepared.network.sweep, override)
  if (!sweep.ok) fail(sweep.problems)
  const frequencies = sweepFrequencies(sweep.sweep)
  const warm = solveNetwork(prepared.network, frequencies)
  if (!warm.ok) fail(warm.problems)
  const times: number[] = []
  for (let r = 0; r < repeat; r++) {
    const t0 = performance.now()
    solveNetwork(prepared.network, frequencies)
    times.push(performance.now() - t0)
  }
  times.sort((a, b) => a - b)
  const middle = times.length >> 1
  const median = times.length % 2 ? times[middle]! : (times[middle - 1]! + times[middle]!) / 2
  const round = (x: number) => Math.round(x * 1000) / 1000
  process.stdout.write(`${JSON.stringify({ points: frequencies.length, blocks: prepared.network.document.blocks.length, medianMs: round(median), minMs: round(times[0]!) })}\n`)
}

main()
