import { magnitudeDb } from './magnitude-db'
import type { ComplexSeries } from './types'

/** Insertion loss −20·log10|S_ji| (dB) of a transmission such as S21. */
export function insertionLoss(data: ComplexSeries): Float64Array {
  return magnitudeDb(data).map(x => -x)
}
