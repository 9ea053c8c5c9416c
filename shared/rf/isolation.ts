import { magnitudeDb } from './magnitude-db'
import type { ComplexSeries } from './types'

/** Isolation −20·log10|S| (dB) of the path to an isolated port, such as S41 of a hybrid. */
export function isolation(data: ComplexSeries): Float64Array {
  return magnitudeDb(data).map(x => -x)
}
