import { prepareNetwork, solveNetwork, type PrepareOptions, type SolveResult } from '../../../shared/solver/index'

/** A complex number as [re, im]. */
export type C = [number, number]

/** A version-1 document from blocks and wires, with a 50 Ω reference and f0 = 2.45 GHz. */
export function doc(blocks: unknown[], wires: Array<[string, string]>, extra: Record<string, unknown> = {}): Record<string, unknown> {
  return { format: 'portwright.network', version: 1, referenceImpedance: 50, variables: { f0: '2.45 GHz', Z0: '50 ohm' }, blocks, wires, ...extra }
}

/** Port block with index i. */
export const port = (i: number, params: Record<string, unknown> = {}) => ({ id: `P${i}`, type: 'port', params: { index: i, ...params } })

/** Solves a document at the given frequencies, failing the test with the problems if it cannot. */
export function solveAt(document: unknown, frequencies: number[], options: PrepareOptions = {}): SolveResult {
  const prepared = prepareNetwork(document, options)
  if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
  const solved = solveNetwork(prepared.network, Float64Array.from(frequencies))
  if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('\n'))
  return solved.result
}

/** S(i, j) (1-based) at frequency index k. */
export function s(result: SolveResult, i: number, j: number, k = 0): C {
  const n = result.ports
  const at = (k * n + i - 1) * n + j - 1
  return [result.re[at]!, result.im[at]!]
}

/** S at frequency index k as a matrix of [re, im]. */
export function matrix(result: SolveResult, k = 0): C[][] {
  return Array.from({ length: result.ports }, (_, i) => Array.from({ length: result.ports }, (_, j) => s(result, i + 1, j + 1, k)))
}

/** Largest entry-wise distance between two complex matrices. */
export function maxDiff(a: C[][], b: C[][]): number {
  let d = 0
  a.forEach((row, i) => row.forEach((x, j) => {
    d = Math.max(d, Math.hypot(x[0] - b[i]![j]![0], x[1] - b[i]![j]![1]))
  }))
  return d
}

export const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]]
export const add = (a: C, b: C): C => [a[0] + b[0], a[1] + b[1]]
export const sub = (a: C, b: C): C => [a[0] - b[0], a[1] - b[1]]
export const div = (a: C, b: C): C => {
  const d = b[0] * b[0] + b[1] * b[1]
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d]
}
export const scale = (a: C, x: number): C => [a[0] * x, a[1] * x]
export const abs = (a: C): number => Math.hypot(a[0], a[1])
export const conj = (a: C): C => [a[0], -a[1]]

/** Sᴴ·S of a complex matrix. */
export function gram(m: C[][]): C[][] {
  const n = m.length
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => {
    let acc: C = [0, 0]
    for (let k = 0; k < n; k++) acc = add(acc, mul(conj(m[k]![i]!), m[k]![j]!))
    return acc
  }))
}

/** Largest singular value of a complex matrix, by power iteration on SᴴS. */
export function largestSingularValue(m: C[][]): number {
  const g = gram(m)
  const n = m.length
  let v: C[] = Array.from({ length: n }, (_, i) => [1 + i * 0.1, 0.3 - i * 0.05] as C)
  let lambda = 0
  for (let iter = 0; iter < 500; iter++) {
    const w: C[] = g.map(row => row.reduce<C>((acc, x, j) => add(acc, mul(x, v[j]!)), [0, 0]))
    const norm = Math.sqrt(w.reduce((acc, x) => acc + x[0] ** 2 + x[1] ** 2, 0))
    if (norm === 0) return 0
    lambda = norm
    v = w.map(x => scale(x, 1 / norm))
  }
  return Math.sqrt(lambda)
}
