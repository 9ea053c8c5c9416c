import { percentile } from './percentile'

/** Spread of a trace over the trials at each frequency. */
export interface TraceEnvelope {
  min: Float64Array
  max: Float64Array
  /** Percentile p → values per frequency. */
  percentiles: Record<number, Float64Array>
}

/**
 * Min, max and percentiles per frequency of trial-major trace values (trial t, frequency k at
 * t·points + k), as recorded by `runTrials`. Unsolved trials (NaN) are left out.
 * @param wanted percentiles (0…100) @default [5, 50, 95]
 */
export function traceEnvelope(values: Float64Array, points: number, wanted: readonly number[] = [5, 50, 95]): TraceEnvelope {
  const trials = points ? values.length / points : 0
  const min = new Float64Array(points), max = new Float64Array(points)
  const percentiles: Record<number, Float64Array> = Object.fromEntries(wanted.map(p => [p, new Float64Array(points)]))
  const column = new Float64Array(trials)
  for (let k = 0; k < points; k++) {
    let n = 0
    for (let t = 0; t < trials; t++) {
      const x = values[t * points + k]!
      if (!Number.isNaN(x)) column[n++] = x
    }
    const sorted = column.subarray(0, n).sort()
    min[k] = n ? sorted[0]! : Number.NaN
    max[k] = n ? sorted[n - 1]! : Number.NaN
    for (const p of wanted) percentiles[p]![k] = percentile(sorted, p)
  }
  return { min, max, percentiles }
}
