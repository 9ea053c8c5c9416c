import { magnitudeDb } from './magnitude-db'
import type { ComplexSeries } from './types'

/** Directivity (dB) = isolation − coupling = 20·log10(|S_coupled| / |S_isolated|), e.g. from S31 and S41. */
export function directivity(coupled: ComplexSeries, isolated: ComplexSeries): Float64Array {
  const c = magnitudeDb(coupled)
  const i = magnitudeDb(isolated)
  return c.map((x, k) => x - i[k]!)
}
