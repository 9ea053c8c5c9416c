import { magnitudeDb } from './magnitude-db'
import type { ComplexSeries } from './types'

/** Amplitude imbalance (dB) between two transmissions: 20·log10|a| − 20·log10|b|, e.g. S21 against S31. */
export function amplitudeImbalance(a: ComplexSeries, b: ComplexSeries): Float64Array {
  const da = magnitudeDb(a)
  const db = magnitudeDb(b)
  return da.map((x, k) => x - db[k]!)
}
