import { magnitudeDb } from './magnitude-db'
import type { ComplexSeries } from './types'

/** Coupling −20·log10|S| (dB) of the path to a coupled port, such as S31 of a hybrid. */
export function coupling(data: ComplexSeries): Float64Array {
  return magnitudeDb(data).map(x => -x)
}
