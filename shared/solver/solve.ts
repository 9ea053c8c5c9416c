import type { Problem } from '../network/types'
import type { PreparedNetwork } from './prepare'

/** S-parameters over frequency: S(i+1)(j+1) at frequency k is at index (k·ports + i)·ports + j. */
export interface SolveResult {
  ports: number
  impedances: number[]
  frequencies: Float64Array
  re: Float64Array
  im: Float64Array
}

/** Outcome of a solve: the result, or the problems (with frequency and blocks) that stopped it. */
export type SolveOutcome = { ok: true; result: SolveResult } | { ok: false; problems: Problem[] }

/**
 * Solves a prepared network at every frequency. A singular join or a block that cannot be
 * evaluated stops the solve with a problem naming the frequency and the blocks; no NaN is returned.
 */
export function solveNetwork(network: PreparedNetwork, frequencies: Float64Array): SolveOutcome {
  const n = network.ports
  const re = new Float64Array(frequencies.length * n * n)
  const im = new Float64Array(frequencies.length * n * n)
  const compiled = network.compiled
  if (!compiled.solveFrequencies(frequencies, re, im)) {
    return { ok: false, problems: [compiled.failure() ?? { message: 'the network cannot be solved' }] }
  }
  return { ok: true, result: { ports: n, impedances: [...network.impedances], frequencies, re, im } }
}
