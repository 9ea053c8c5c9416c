import { magnitudeDb } from '../rf/magnitude-db'
import { phaseDeg } from '../rf/phase-deg'
import { sParameter } from '../rf/s-parameter'
import type { SParameterSet } from '../rf/types'

/** A trace whose spread a tolerance run records: S(to, from) in dB or degrees, ports from 1. */
export interface TraceSpec {
  to: number
  from: number
  form: 'magnitudeDb' | 'phaseDeg'
}

/** The trace's values at each frequency of the data. */
export function traceValues(data: SParameterSet, trace: TraceSpec): Float64Array {
  const series = sParameter(data, trace.to, trace.from)
  return trace.form === 'magnitudeDb' ? magnitudeDb(series) : phaseDeg(series)
}
