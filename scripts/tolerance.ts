/**
 * `npm run -s tolerance -- FILE.json --trials N --seed S`
 * Draws N designs from the document's `tolerances`, solves each and judges it against its `spec`; prints
 * {"trials": N, "passed": n, "yield": n/N, "seed": S}. The same seed gives the same answer.
 * Bad input: exit status 2, one line per problem on standard error, nothing on standard output.
 */
import { parseArgs } from 'node:util'
import { prepareTuning, resolveTolerances, runTrials } from '../shared/tuning/index'
import { cliPrepareOptions, endQuietlyWhenOutputCloses, fail, readDocument } from './network-cli'
import { wholeNumberOption } from './option-values'

const USAGE = 'usage: npm run -s tolerance -- FILE.json --trials N --seed S'

function main(): void {
  let parsed
  try {
    parsed = parseArgs({ allowPositionals: true, options: { trials: { type: 'string' }, seed: { type: 'string' } } })
  } catch (error) {
    fail([(error as Error).message, USAGE])
  }
  const { values, positionals } = parsed
  const problems: string[] = []
  if (positionals.length !== 1) problems.push(USAGE)
  const trials = wholeNumberOption(problems, 'trials', values.trials, { min: 1, max: 1_000_000 }, 1000)
  const seed = wholeNumberOption(problems, 'seed', values.seed, { min: 0, max: 2 ** 32 - 1 }, 1)
  if (problems.length) fail(problems)
  const path = positionals[0]!
  const prepared = prepareTuning(readDocument(path), cliPrepareOptions(path))
  if (!prepared.ok) fail(prepared.problems)
  const spreads = resolveTolerances(prepared.setup)
  if (!spreads.ok) fail(spreads.problems)
  const run = runTrials(prepared.setup, spreads.spreads, { seed: seed!, to: trials! })
  if (run.unsolved) process.stderr.write(`note: ${run.unsolved} drawn design${run.unsolved === 1 ? '' : 's'} could not be solved (a value drawn out of its allowed range); counted as failed\n`)
  process.stdout.write(`${JSON.stringify({ trials, passed: run.passed, yield: run.passed / trials!, seed })}\n`)
}

endQuietlyWhenOutputCloses()
main()
