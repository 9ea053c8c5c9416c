import type { ComplexSeries } from './types'

/** Phase of x in degrees, wrapped to (−180°, 180°]. */
export function phaseDeg(data: ComplexSeries): Float64Array {
  const out = new Float64Array(data.re.length)
  for (let k = 0; k < out.length; k++) {
    const angle = (Math.atan2(data.im[k]!, data.re[k]!) * 180) / Math.PI
    out[k] = angle === -180 ? 180 : angle
  }
  return out
}
