/**
 * `npm run -s beams -- FILE.json --inputs 1,2,… --outputs 5,6,… --spacing WAVELENGTHS [--frequency F]`
 * Feeds a uniform linear array of isotropic elements (the outputs in order, spacing in wavelengths at F,
 * default the spec's centre) from each input in turn and prints
 * {"frequency", "beams": [{"input", "peakDeg", "peakDb", "halfPowerWidthDeg", "sidelobeDb"}], "crossoverDb"}.
 * Bad input: exit status 2, one line per problem on standard error, nothing on standard output.
 */
import { parseArgs } from 'node:util'
import { beamFigures, beamWeights, crossoverDb, type ArrayGeometry, type BeamFigures } from '../shared/beams/index'
import { evaluateQuantity } from '../shared/network/expression'
import { formatQuantity } from '../shared/network/format-quantity'
import { resolveSpec } from '../shared/network/spec'
import { prepareNetwork, solveNetwork } from '../shared/solver/index'
import { cliPrepareOptions, endQuietlyWhenOutputCloses, fail, readDocument } from './network-cli'
import { portListOption, positiveNumberOption } from './option-values'

const USAGE = 'usage: npm run -s beams -- FILE.json --inputs 1,2,… --outputs 5,6,… --spacing WAVELENGTHS [--frequency F]'
// Printed figures are rounded to a millionth (of a degree or decibel): finer digits are only rounding noise.
const round = (x: number | null) => (x === null ? null : Math.round(x * 1e6) / 1e6)

function main(): void {
  let parsed
  try {
    parsed = parseArgs({ allowPositionals: true, options: { inputs: { type: 'string' }, outputs: { type: 'string' }, spacing: { type: 'string' }, frequency: { type: 'string' } } })
  } catch (error) {
    fail([(error as Error).message, USAGE])
  }
  const { values, positionals } = parsed
  const problems: string[] = []
  if (positionals.length !== 1) problems.push(USAGE)
  const inputs = portListOption(problems, 'inputs', values.inputs)
  const outputs = portListOption(problems, 'outputs', values.outputs)
  const spacing = positiveNumberOption(problems, 'spacing', values.spacing, 100)
  let frequency: number | undefined
  if (values.frequency !== undefined) {
    const text = values.frequency
    const outcome = evaluateQuantity(text.trim() !== '' && Number.isFinite(Number(text)) ? Number(text) : text, 'frequency', new Map())
    if (!outcome.ok) problems.push(`--frequency: ${outcome.error}`)
    else if (!(outcome.value > 0)) problems.push(`--frequency: must be above 0 Hz (got ${formatQuantity(outcome.value, 'frequency')})`)
    else frequency = outcome.value
  }
  const shared = inputs && outputs ? inputs.find(p => outputs.includes(p)) : undefined
  if (shared !== undefined) problems.push(`--outputs: port ${shared} is also one of the --inputs`)
  if (problems.length) fail(problems)

  const path = positionals[0]!
  const prepared = prepareNetwork(readDocument(path), cliPrepareOptions(path))
  if (!prepared.ok) fail(prepared.problems)
  const ports = prepared.network.ports
  for (const [option, list] of [['inputs', inputs!], ['outputs', outputs!]] as const) {
    const missing = list.find(p => p > ports)
    if (missing !== undefined) problems.push(`--${option}: port ${missing} does not exist (the network has ${ports} port${ports === 1 ? '' : 's'})`)
  }
  if (frequency === undefined) {
    const spec = resolveSpec(prepared.network.document)
    if (spec === undefined) problems.push('--frequency: is required, because the document has no spec centre to use')
    else if (!spec.ok) problems.push(...spec.problems.map(p => p.message))
    else frequency = spec.spec.center
  }
  if (problems.length) fail(problems)

  const solved = solveNetwork(prepared.network, Float64Array.of(frequency!))
  if (!solved.ok) fail(solved.problems)
  const geometry: ArrayGeometry = { spacing: spacing! }
  const beams: Array<{ input: number; weights: ReturnType<typeof beamWeights>; figures: BeamFigures }> = []
  for (const input of inputs!) {
    const weights = beamWeights(solved.result, 0, input, outputs!)
    try {
      beams.push({ input, weights, figures: beamFigures(weights, geometry) })
    } catch {
      problems.push(`--inputs: port ${input} delivers no power to the outputs ${outputs!.join(', ')} at ${formatQuantity(frequency!, 'frequency')}`)
    }
  }
  if (problems.length) fail(problems)
  // Neighbours in angle; the figure is the deepest crossing, the one that limits coverage.
  const byAngle = [...beams].sort((a, b) => a.figures.peakDeg - b.figures.peakDeg)
  let crossover: number | null = null
  for (let i = 0; i + 1 < byAngle.length; i++) {
    const level = crossoverDb({ weights: byAngle[i]!.weights, peakDeg: byAngle[i]!.figures.peakDeg }, { weights: byAngle[i + 1]!.weights, peakDeg: byAngle[i + 1]!.figures.peakDeg }, geometry)
    crossover = crossover === null ? level : Math.min(crossover, level)
  }
  const output = {
    frequency,
    beams: beams.map(({ input, figures }) => ({ input, peakDeg: round(figures.peakDeg), peakDb: round(figures.peakDb), halfPowerWidthDeg: round(figures.halfPowerWidthDeg), sidelobeDb: round(figures.sidelobeDb) })),
    crossoverDb: round(crossover),
  }
  process.stdout.write(`${JSON.stringify(output)}\n`)
}

endQuietlyWhenOutputCloses()
main()
