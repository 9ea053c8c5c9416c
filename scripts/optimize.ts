/**
 * `npm run -s optimize -- FILE.json [--seed S] [--max-evaluations N]`
 * Varies the document's `tunables` within their ranges towards meeting its `spec` and prints the changed
 * document; the last line on standard error is {"met": bool, "evaluations": n}.
 * Bad input: exit status 2, one line per problem on standard error, nothing on standard output.
 */
import { parseArgs } from 'node:util'
import type { NetworkDocument } from '../shared/network/types'
import { applyValues, optimizeTunables, prepareTuning, resolveTunables } from '../shared/tuning/index'
import { cliPrepareOptions, endQuietlyWhenOutputCloses, fail, readDocument } from './network-cli'
import { wholeNumberOption } from './option-values'

const USAGE = 'usage: npm run -s optimize -- FILE.json [--seed S] [--max-evaluations N]'

function main(): void {
  let parsed
  try {
    parsed = parseArgs({ allowPositionals: true, options: { 'seed': { type: 'string' }, 'max-evaluations': { type: 'string' } } })
  } catch (error) {
    fail([(error as Error).message, USAGE])
  }
  const { values, positionals } = parsed
  const problems: string[] = []
  if (positionals.length !== 1) problems.push(USAGE)
  const seed = wholeNumberOption(problems, 'seed', values.seed, { min: 0, max: 2 ** 32 - 1 }, 1)
  const maxEvaluations = wholeNumberOption(problems, 'max-evaluations', values['max-evaluations'], { min: 1, max: 1_000_000 }, 2000)
  if (problems.length) fail(problems)
  const path = positionals[0]!
  const input = readDocument(path)
  const prepared = prepareTuning(input, cliPrepareOptions(path))
  if (!prepared.ok) fail(prepared.problems)
  const ranges = resolveTunables(prepared.setup)
  if (!ranges.ok) fail(ranges.problems)
  const result = optimizeTunables(prepared.setup, ranges.ranges, { seed, maxEvaluations })
  // Written into the document as read, so keys the schema does not know and the layout survive unchanged.
  const changed = applyValues(input as NetworkDocument, ranges.ranges.map(r => r.target), result.values)
  process.stdout.write(`${JSON.stringify(changed, null, 2)}\n`)
  process.stderr.write(`${JSON.stringify({ met: result.met, evaluations: result.evaluations })}\n`)
}

endQuietlyWhenOutputCloses()
main()
