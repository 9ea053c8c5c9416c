import { prepareNetwork, solveNetwork } from '../../../../shared/solver/index'
import type { GoldenNetwork } from './networks'

/** S of one golden network: per frequency the ports×ports matrix, row-major, as [re, im] pairs. */
export interface GoldenResult {
  frequencies: number[]
  ports: number
  s: Array<Array<[number, number]>>
}

/** Prepares and solves a golden network; throws with the problems when it cannot. */
export function solveGolden(network: GoldenNetwork): GoldenResult {
  const prepared = prepareNetwork(network.document, network.options)
  if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
  const solved = solveNetwork(prepared.network, Float64Array.from(network.frequencies))
  if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('\n'))
  const { ports, re, im } = solved.result
  const nn = ports * ports
  const s = network.frequencies.map((_, k) => Array.from({ length: nn }, (_, e): [number, number] => [re[k * nn + e]!, im[k * nn + e]!]))
  return { frequencies: network.frequencies, ports, s }
}
