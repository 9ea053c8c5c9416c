import type { ComplexSeries, SParameterSet } from './types'

/** S(to, from) over frequency, ports counted from 1 as in the document (S21: to 2, from 1). */
export function sParameter(data: SParameterSet, to: number, from: number): ComplexSeries {
  const n = data.ports
  if (!(to >= 1 && to <= n && from >= 1 && from <= n)) throw new RangeError(`S${to}${from} does not exist in a ${n}-port`)
  const points = data.frequencies.length
  const re = new Float64Array(points), im = new Float64Array(points)
  for (let k = 0; k < points; k++) {
    const at = (k * n + to - 1) * n + from - 1
    re[k] = data.re[at]!
    im[k] = data.im[at]!
  }
  return { re, im }
}
