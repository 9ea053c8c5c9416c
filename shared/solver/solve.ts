import type { Problem } from '../network/types'
import { formatQuantity } from '../network/format-quantity'
import type { PreparedNetwork } from './prepare'

/** S-parameters over frequency: S(i+1)(j+1) at frequency k is at index (k·ports + i)·ports + j. */
export interface SolveResult {
  ports: number
  impedances: number[]
  frequencies: Float64Array
  re: Float64Array
  im: Float64Array
}

/**
 * Outcome of a solve: the result (with warnings about isolated frequencies where a resonance
 * is cut off from every port, and about block models used outside their published ranges),
 * or the problems (with frequency and blocks) that stopped it.
 */
export type SolveOutcome = { ok: true; result: SolveResult; warnings: Problem[] } | { ok: false; problems: Problem[] }

/** Options of `solveNetwork`. */
export interface SolveOptions {
  /** Arrays to write S into (reused when their length fits), so repeated sweeps allocate nothing. @default new arrays */
  output?: { re: Float64Array; im: Float64Array }
}

/** Relative frequency step used to approach an isolated singular frequency from both sides. */
const NUDGE = 1e-7

/**
 * Solves a prepared network at every frequency. A singular join or a block that cannot be
 * evaluated stops the solve with a problem naming the frequency and the blocks; no NaN is returned.
 *
 * A resonance cut off from every port (a from-lines branch-line hybrid at exactly 2·f0, say) makes
 * the join singular at one frequency only; S itself is continuous there, so the sweep goes on
 * with the mean of S just above and just below that frequency and a warning naming it. A network
 * that is singular at the neighbouring frequencies too is reported as a problem.
 */
export function solveNetwork(network: PreparedNetwork, frequencies: Float64Array, options: SolveOptions = {}): SolveOutcome {
  const n = network.ports
  const size = frequencies.length * n * n
  const re = options.output?.re.length === size ? options.output.re : new Float64Array(size)
  const im = options.output?.im.length === size ? options.output.im : new Float64Array(size)
  const compiled = network.compiled
  const result = { ports: n, impedances: [...network.impedances], frequencies, re, im }
  const notes = notesFor(network, frequencies)
  if (compiled.solveFrequencies(frequencies, re, im)) return { ok: true, result, warnings: notes }
  if (!compiled.failedAsSingular()) return { ok: false, problems: [failureOf(compiled)] }
  // Slow path, only for sweeps that hit a singular frequency: one frequency at a time.
  const warnings: Problem[] = [...notes]
  const nn = n * n
  for (let k = 0; k < frequencies.length; k++) {
    const f = frequencies[k]!
    if (compiled.solveAt(f, re, im, k * nn)) continue
    const failure = failureOf(compiled)
    if (!compiled.failedAsSingular() || !solveBeside(compiled, f, re, im, k * nn, nn)) return { ok: false, problems: [failure] }
    warnings.push({ ...failure, message: `${failure.message}; the value shown at ${formatQuantity(f, 'frequency')} is the limit from the neighbouring frequencies` })
  }
  return { ok: true, result, warnings }
}

type Compiled = PreparedNetwork['compiled']

/** Block models used outside their ranges at these frequencies, as warnings naming the block. */
export function notesFor(network: PreparedNetwork, frequencies: Float64Array): Problem[] {
  let highest = -Infinity
  for (const f of frequencies) highest = Math.max(highest, f)
  return network.notes
    .filter(note => note.above === undefined || highest > note.above)
    .map(({ above: _above, ...problem }) => problem)
}

function failureOf(compiled: Compiled): Problem {
  return compiled.failure() ?? { message: 'the network cannot be solved' }
}

/** Writes the mean of S a hair above and below f (or the one side that solves); false if neither does. */
function solveBeside(compiled: Compiled, f: number, re: Float64Array, im: Float64Array, offset: number, nn: number): boolean {
  const step = Math.max(Math.abs(f) * NUDGE, 1e-3)
  const above = { re: new Float64Array(nn), im: new Float64Array(nn) }
  const below = { re: new Float64Array(nn), im: new Float64Array(nn) }
  const okAbove = compiled.solveAt(f + step, above.re, above.im, 0)
  const okBelow = f - step > 0 && compiled.solveAt(f - step, below.re, below.im, 0)
  if (!okAbove && !okBelow) return false
  for (let e = 0; e < nn; e++) {
    const count = (okAbove ? 1 : 0) + (okBelow ? 1 : 0)
    re[offset + e] = ((okAbove ? above.re[e]! : 0) + (okBelow ? below.re[e]! : 0)) / count
    im[offset + e] = ((okAbove ? above.im[e]! : 0) + (okBelow ? below.im[e]! : 0)) / count
  }
  return true
}
