/**
 * `npm run -s solve -- FILE.json [--format touchstone|json] [--start F] [--stop F] [--points N] [--spacing linear|log]`
 * Solves a network document and prints Touchstone (or JSON) on standard output.
 * A bad document exits with status 2, one problem per line on standard error, nothing on standard output.
 */
import { parseArgs } from 'node:util'
import { prepareNetwork, resolveSweep, solveNetwork, sweepFrequencies } from '../shared/solver/index'
import { solveResultJsonText } from '../shared/solver/solve-json'
import { writeTouchstone } from '../shared/touchstone/write'
import { cliPrepareOptions, endQuietlyWhenOutputCloses, fail, readDocument, sweepOverride } from './network-cli'

function main(): void {
  let parsed
  try {
    parsed = parseArgs({
      allowPositionals: true,
      options: { format: { type: 'string' }, start: { type: 'string' }, stop: { type: 'string' }, points: { type: 'string' }, spacing: { type: 'string' } },
    })
  } catch (error) {
    fail([(error as Error).message])
  }
  const { values, positionals } = parsed
  if (positionals.length !== 1) fail(['usage: npm run -s solve -- FILE.json [--format touchstone|json] [--start F] [--stop F] [--points N] [--spacing linear|log]'])
  const format = values.format ?? 'touchstone'
  if (format !== 'touchstone' && format !== 'json') fail([`--format: must be touchstone or json (got "${format}")`])
  const path = positionals[0]!
  const override = sweepOverride(values)
  const prepared = prepareNetwork(readDocument(path), cliPrepareOptions(path))
  if (!prepared.ok) fail(prepared.problems)
  const sweep = resolveSweep(prepared.network.sweep, override)
  if (!sweep.ok) fail(sweep.problems)
  const solved = solveNetwork(prepared.network, sweepFrequencies(sweep.sweep))
  if (!solved.ok) fail(solved.problems)
  // Isolated resonances cut off from every port: the result is complete, but say where.
  for (const warning of solved.warnings) process.stderr.write(`warning: ${warning.message}\n`)
  const name = prepared.network.document.name
  const output = format === 'json'
    ? `${solveResultJsonText(solved.result)}\n`
    : writeTouchstone(solved.result, { comments: [`Portwright solve${name ? `: ${name}` : ''}`, `${solved.result.ports} ports, ${solved.result.frequencies.length} frequencies`], caution: true })
  process.stdout.write(output)
}

endQuietlyWhenOutputCloses()
main()
