import { conditionMargin } from './condition-margin'
import { describeCondition, type SpecMask } from './spec-mask'
import type { SParameterSet } from './types'

/** The contiguous band around the centre meeting every condition, and what limits each edge. */
export type BandwidthResult =
  | {
    ok: true
    /** Band edges (Hz), interpolated between the last passing and first failing samples. */
    low: number
    high: number
    center: number
    /** high − low (Hz) and (high − low)/center. */
    width: number
    fractional: number
    /** The condition that ends the band on each side, or 'sweep' when the band reaches the sweep's end. */
    lowLimit: string
    highLimit: string
  }
  | { ok: false; reason: string }

/**
 * Finds the contiguous band around `mask.center` where every condition holds. Edges are
 * placed where the smallest margin crosses zero, by linear interpolation between samples;
 * a band that reaches the end of the sweep is marked as limited by the sweep.
 */
export function findBandwidth(data: SParameterSet, mask: SpecMask): BandwidthResult {
  const f = data.frequencies
  const points = f.length
  if (points === 0) return { ok: false, reason: 'there are no frequencies' }
  if (mask.conditions.length === 0) return { ok: false, reason: 'the spec has no conditions' }
  if (!(mask.center >= f[0]! && mask.center <= f[points - 1]!)) return { ok: false, reason: `the centre ${mask.center} Hz is outside the sweep` }
  const margins = mask.conditions.map(condition => conditionMargin(data, condition))
  const worst = new Float64Array(points).fill(Infinity)
  const culprit = new Int32Array(points).fill(-1)
  margins.forEach((margin, c) => {
    for (let k = 0; k < points; k++) {
      if (margin[k]! < worst[k]!) {
        worst[k] = margin[k]!
        culprit[k] = c
      }
    }
  })
  let center = 0
  for (let k = 1; k < points; k++) if (Math.abs(f[k]! - mask.center) < Math.abs(f[center]! - mask.center)) center = k
  if (!(worst[center]! >= 0)) {
    return { ok: false, reason: `the spec is not met at the centre: ${describeCondition(mask.conditions[culprit[center]!]!)} fails` }
  }
  let lo = center
  while (lo > 0 && worst[lo - 1]! >= 0) lo--
  let hi = center
  while (hi < points - 1 && worst[hi + 1]! >= 0) hi++
  // Margin crosses zero between a passing sample p and a failing neighbour q.
  const edge = (p: number, q: number): number => {
    const mp = worst[p]!, mq = worst[q]!
    if (!Number.isFinite(mq) || !Number.isFinite(mp)) return f[p]!
    return f[p]! + ((f[q]! - f[p]!) * mp) / (mp - mq)
  }
  const low = lo === 0 ? f[0]! : edge(lo, lo - 1)
  const high = hi === points - 1 ? f[points - 1]! : edge(hi, hi + 1)
  return {
    ok: true,
    low,
    high,
    center: mask.center,
    width: high - low,
    fractional: (high - low) / mask.center,
    lowLimit: lo === 0 ? 'sweep' : describeCondition(mask.conditions[culprit[lo - 1]!]!),
    highLimit: hi === points - 1 ? 'sweep' : describeCondition(mask.conditions[culprit[hi + 1]!]!),
  }
}
