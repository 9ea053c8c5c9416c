/**
 * The p-th percentile (0…100) of sorted values by linear interpolation between order statistics
 * (Hyndman & Fan, "Sample quantiles in statistical packages", Am. Stat. 50(4), 1996, definition 7).
 * NaN for no values.
 */
export function percentile(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length
  if (n === 0) return Number.NaN
  const h = ((n - 1) * Math.min(Math.max(p, 0), 100)) / 100
  const lo = Math.floor(h)
  const hi = Math.min(lo + 1, n - 1)
  return sorted[lo]! + (h - lo) * (sorted[hi]! - sorted[lo]!)
}
