/**
 * `npm run -s design -- KIND [--OPTION VALUE …]`
 * Prints a version-1.1 network document of line-level blocks with a sweep around the centre
 * frequency and a spec. Bad input exits with status 2, one line per problem naming the option.
 */
import { DESIGN_ASSISTANTS, DESIGN_KINDS, isDesignKind, isSubstrateOption, runDesign, SUBSTRATE_OPTIONS } from '../shared/design/index'
import { endQuietlyWhenOutputCloses, fail } from './network-cli'

function usage(): string {
  return [
    'usage: npm run -s design -- KIND [--OPTION VALUE …]',
    ...DESIGN_KINDS.map(kind => `  ${kind} ${DESIGN_ASSISTANTS[kind].options.filter(o => !isSubstrateOption(o.name)).map(o => (o.required ? `--${o.name} V` : `[--${o.name} V]`)).join(' ')}`),
    `  in microstrip (coupled-line as coupled microstrips): ${SUBSTRATE_OPTIONS.map(o => `[--${o.name} V]`).join(' ')}`,
    '  quadrature in microstrip also: [--substrate-junctions tee|ideal] (default tee: tee junctions, arms compensated)',
  ].join('\n')
}

/** Splits `--name value` pairs; every problem names the option. */
function readPairs(args: string[]): { given: Record<string, string>; problems: string[] } {
  const given: Record<string, string> = {}
  const problems: string[] = []
  for (let i = 0; i < args.length; i++) {
    const word = args[i]!
    const eq = word.startsWith('--') ? word.indexOf('=') : -1
    if (!word.startsWith('--') || word.length < 3) { problems.push(`${word}: expected an option such as --frequency`); continue }
    const name = eq > 0 ? word.slice(2, eq) : word.slice(2)
    const value = eq > 0 ? word.slice(eq + 1) : args[++i]
    if (value === undefined) problems.push(`--${name}: needs a value`)
    else if (Object.hasOwn(given, name)) problems.push(`--${name}: given twice`)
    else given[name] = value
  }
  return { given, problems }
}

function main(): void {
  const [kind, ...rest] = process.argv.slice(2)
  if (kind === undefined || kind === '--help') fail([usage()])
  if (!isDesignKind(kind)) fail([`${kind}: not a design kind (one of ${DESIGN_KINDS.join(', ')})`, usage()])
  const { given, problems } = readPairs(rest)
  if (problems.length) fail(problems)
  const outcome = runDesign(kind, given)
  if (!outcome.ok) fail(outcome.problems.map(p => `--${p.option}: ${p.message}`))
  process.stdout.write(`${JSON.stringify(outcome.document, null, 2)}\n`)
}

endQuietlyWhenOutputCloses()
main()
