import type { ComplexSeries } from './types'

/** VSWR = (1 + |Γ|)/(1 − |Γ|) of a reflection; Infinity at total reflection. */
export function vswr(reflection: ComplexSeries): Float64Array {
  const out = new Float64Array(reflection.re.length)
  for (let k = 0; k < out.length; k++) {
    const g = Math.hypot(reflection.re[k]!, reflection.im[k]!)
    out[k] = g >= 1 ? Number.POSITIVE_INFINITY : (1 + g) / (1 - g)
  }
  return out
}
