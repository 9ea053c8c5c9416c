import type { ComplexSeries } from './types'

/** 20·log10|x| at each frequency; −Infinity where x is exactly zero. */
export function magnitudeDb(data: ComplexSeries): Float64Array {
  const out = new Float64Array(data.re.length)
  for (let k = 0; k < out.length; k++) out[k] = 10 * Math.log10(data.re[k]! ** 2 + data.im[k]! ** 2)
  return out
}
