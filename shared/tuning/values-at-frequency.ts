/**
 * One value per trial from trial-major trace values: those at the recorded frequency nearest to `frequency`
 * (e.g. the spec's centre, for a histogram of a figure there).
 */
export function valuesAtFrequency(values: Float64Array, frequencies: Float64Array, frequency: number): Float64Array {
  const points = frequencies.length
  if (points === 0) return new Float64Array(0)
  let k = 0
  for (let i = 1; i < points; i++) if (Math.abs(frequencies[i]! - frequency) < Math.abs(frequencies[k]! - frequency)) k = i
  const trials = values.length / points
  return Float64Array.from({ length: trials }, (_, t) => values[t * points + k]!)
}
