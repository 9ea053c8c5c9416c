/** Counts of values in equal bins between `edges[0]` and `edges[bins]`. */
export interface Histogram {
  edges: Float64Array
  counts: Uint32Array
}

/**
 * Histogram of values (NaN left out) in `bins` equal bins over [min, max] of the values, or over the
 * given range (values outside it are left out); the top edge belongs to the last bin.
 * @param bins @default 20
 */
export function histogram(values: ArrayLike<number>, bins = 20, range?: { min: number; max: number }): Histogram {
  let lo = range?.min ?? Number.POSITIVE_INFINITY
  let hi = range?.max ?? Number.NEGATIVE_INFINITY
  if (!range) {
    for (let i = 0; i < values.length; i++) {
      const x = values[i]!
      if (Number.isNaN(x)) continue
      if (x < lo) lo = x
      if (x > hi) hi = x
    }
  }
  const counts = new Uint32Array(bins)
  if (!(hi >= lo)) return { edges: new Float64Array(bins + 1).fill(Number.NaN), counts }
  // All values equal: a bin of width 1 around them keeps the edges meaningful.
  if (hi === lo) { lo -= 0.5; hi += 0.5 }
  const width = (hi - lo) / bins
  const edges = Float64Array.from({ length: bins + 1 }, (_, i) => (i === bins ? hi : lo + i * width))
  for (let i = 0; i < values.length; i++) {
    const x = values[i]!
    if (!(x >= lo && x <= hi)) continue
    counts[Math.min(Math.floor((x - lo) / width), bins - 1)]!++
  }
  return { edges, counts }
}
