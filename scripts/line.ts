/**
 * `npm run -s line -- --permittivity ER --height H (--width W | --impedance Z) [--thickness T] [--frequency F]
 *  [--degrees D] [--loss-tangent TD] [--conductivity S] [--roughness R]`
 * Analyses (given --width) or synthesises (given --impedance) a microstrip line and prints one JSON line
 * {"width", "impedance", "epsEff", "wavelength"?, "length"?, "lossDbPerMetre"?} in SI units.
 * With --frequency the values are those at that frequency (dispersion included); without it, static.
 * Models used outside their published ranges: "warning: …" lines on standard error, exit 0.
 * Bad input: exit 2, one line per problem naming the option, nothing on standard output.
 */
import { parseArgs } from 'node:util'
import { lineFigures } from '../shared/microstrip/line-figures'
import type { MicrostripSubstrate } from '../shared/microstrip/types'
import type { QuantityKind } from '../shared/network/quantities'
import { endQuietlyWhenOutputCloses, fail, quantityOption } from './network-cli'

const USAGE = 'usage: npm run -s line -- --permittivity ER --height H (--width W | --impedance Z) [--thickness T] [--frequency F] [--degrees D] [--loss-tangent TD] [--conductivity S] [--roughness R]'

/** Each option: its quantity kind and the range it must lie in (inclusive `min` or exclusive `above`). */
const OPTIONS: Record<string, { kind: QuantityKind; min?: number; above?: number; what: string }> = {
  'permittivity': { kind: 'ratio', min: 1, what: 'at least 1' },
  'height': { kind: 'length', above: 0, what: 'greater than zero' },
  'width': { kind: 'length', above: 0, what: 'greater than zero' },
  'impedance': { kind: 'impedance', above: 0, what: 'greater than zero' },
  'thickness': { kind: 'length', min: 0, what: 'zero or more' },
  'frequency': { kind: 'frequency', above: 0, what: 'greater than zero' },
  'degrees': { kind: 'angle', min: 0, what: 'zero or more' },
  'loss-tangent': { kind: 'ratio', min: 0, what: 'zero or more' },
  'conductivity': { kind: 'conductivity', above: 0, what: 'greater than zero' },
  'roughness': { kind: 'length', min: 0, what: 'zero or more' },
}

/** `--height -1` would read as a missing value followed by an option; join each known option with its value. */
function joinValues(args: readonly string[]): string[] {
  const joined: string[] = []
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!
    const next = args[i + 1]
    if (arg.startsWith('--') && !arg.includes('=') && arg.slice(2) in OPTIONS && next !== undefined && !(next.slice(2) in OPTIONS && next.startsWith('--'))) {
      joined.push(`${arg}=${next}`)
      i++
    } else joined.push(arg)
  }
  return joined
}

function readOptions(): Record<string, number | undefined> {
  let parsed
  try {
    parsed = parseArgs({ args: joinValues(process.argv.slice(2)), options: Object.fromEntries(Object.keys(OPTIONS).map(name => [name, { type: 'string' as const }])) })
  } catch (error) {
    // Node's messages run over several lines; the first says what is wrong.
    fail([`${(error as Error).message.split('\n')[0]!} (${USAGE})`])
  }
  const problems: string[] = []
  const values: Record<string, number | undefined> = {}
  for (const [name, spec] of Object.entries(OPTIONS)) {
    const text = (parsed.values as Record<string, string | undefined>)[name]
    if (text === undefined) continue
    const outcome = quantityOption(name, text, spec.kind)
    if (!outcome.ok) problems.push(outcome.error)
    else if ((spec.min !== undefined && outcome.value < spec.min) || (spec.above !== undefined && !(outcome.value > spec.above))) problems.push(`--${name}: must be ${spec.what} (got ${text})`)
    else values[name] = outcome.value
  }
  const given = (name: string) => (parsed.values as Record<string, unknown>)[name] !== undefined
  if (!given('permittivity')) problems.push('--permittivity: is required (relative permittivity of the substrate, e.g. 3.5)')
  if (!given('height')) problems.push('--height: is required (dielectric height, e.g. "0.508 mm")')
  if (given('width') && given('impedance')) problems.push('--width: give either --width (analysis) or --impedance (synthesis), not both')
  if (!given('width') && !given('impedance')) problems.push('--width: give --width to analyse a line or --impedance to find its width')
  if (given('degrees') && !given('frequency')) problems.push('--degrees: needs --frequency, the frequency at which the line has that electrical length')
  if (problems.length) fail(problems)
  return values
}

function main(): void {
  const o = readOptions()
  const substrate: MicrostripSubstrate = {
    permittivity: o.permittivity!,
    height: o.height!,
    thickness: o.thickness ?? 0,
    lossTangent: o['loss-tangent'] ?? 0,
    roughness: o.roughness ?? 0,
    ...(o.conductivity !== undefined ? { conductivity: o.conductivity } : {}),
  }
  const frequency = o.frequency
  const question = o.width !== undefined ? { width: o.width } : { impedance: o.impedance! }
  const outcome = lineFigures(substrate, { ...question, ...(frequency !== undefined ? { frequency } : {}), ...(o.degrees !== undefined ? { degrees: o.degrees } : {}) })
  if (!outcome.ok) fail([`--${outcome.field}: ${outcome.message}`])
  for (const note of outcome.notes) process.stderr.write(`warning: ${note.message}\n`)
  const output = outcome.figures
  process.stdout.write(`${JSON.stringify(output)}\n`)
}

endQuietlyWhenOutputCloses()
main()
