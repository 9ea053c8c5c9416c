import { magnitudeDb } from './magnitude-db'
import type { ComplexSeries } from './types'

/** Return loss −20·log10|S_ii| (dB) of a reflection such as S11. */
export function returnLoss(data: ComplexSeries): Float64Array {
  return magnitudeDb(data).map(x => -x)
}
