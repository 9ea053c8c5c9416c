import type { NetworkDocument } from '../network/types'
import { solveDocument } from '../solver/index'

/**
 * Middle (Hz) of the band where a four-port hybrid is matched and isolated: both |S11| and |S41|
 * at or below −20 dB, grown from the best frequency of a sweep over f0·(1 ± span) and its edges
 * interpolated linearly in |S|². The whole sweep when no frequency reaches −20 dB is not a band:
 * the best frequency is then returned.
 */
export function matchedBandCentre(document: NetworkDocument, f0: number, span = 0.6, points = 1201): number {
  const solved = solveDocument({ ...document, sweep: { start: f0 * (1 - span), stop: f0 * (1 + span), points, spacing: 'linear' } })
  if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('; '))
  const { re, im, frequencies } = solved.result
  const limit = 0.01
  const worst = (k: number) => Math.max(re[k * 16]! ** 2 + im[k * 16]! ** 2, re[k * 16 + 12]! ** 2 + im[k * 16 + 12]! ** 2)
  let best = 0
  for (let k = 1; k < points; k++) if (worst(k) < worst(best)) best = k
  if (worst(best) > limit) return frequencies[best]!
  let low = best, high = best
  while (low > 0 && worst(low - 1) <= limit) low--
  while (high < points - 1 && worst(high + 1) <= limit) high++
  const edge = (inside: number, outside: number) => {
    if (outside < 0 || outside >= points) return frequencies[inside]!
    const a = worst(inside), b = worst(outside)
    return frequencies[inside]! + ((limit - a) / (b - a)) * (frequencies[outside]! - frequencies[inside]!)
  }
  return 0.5 * (edge(low, low - 1) + edge(high, high + 1))
}
