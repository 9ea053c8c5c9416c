import type { NetworkDocument } from '../network/types'
import { solveDocument } from '../solver/index'

/**
 * Centre frequency (Hz) of a quadrature hybrid: where |S11|² + |S41|² (mismatch plus leakage to
 * the isolated port) is least, searched on a grid of `points` over f0·(1 ± span) and refined by
 * a parabola through the best point and its neighbours.
 */
export function branchLineCentre(document: NetworkDocument, f0: number, span = 0.2, points = 801): number {
  const start = f0 * (1 - span), stop = f0 * (1 + span)
  const solved = solveDocument({ ...document, sweep: { start, stop, points, spacing: 'linear' } })
  if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('; '))
  const { re, im, frequencies } = solved.result
  const cost = (k: number) => re[k * 16]! ** 2 + im[k * 16]! ** 2 + re[k * 16 + 12]! ** 2 + im[k * 16 + 12]! ** 2
  let best = 1
  for (let k = 1; k < points - 1; k++) if (cost(k) < cost(best)) best = k
  const a = cost(best - 1), b = cost(best), c = cost(best + 1)
  const step = frequencies[1]! - frequencies[0]!
  const denominator = a - 2 * b + c
  return frequencies[best]! + (denominator > 0 ? 0.5 * step * (a - c) / denominator : 0)
}
