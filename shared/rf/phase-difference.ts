import type { ComplexSeries } from './types'

/** Phase of a relative to b in degrees, wrapped to (−180°, 180°]: the angle of a·conj(b). */
export function phaseDifference(a: ComplexSeries, b: ComplexSeries): Float64Array {
  const out = new Float64Array(a.re.length)
  for (let k = 0; k < out.length; k++) {
    const re = a.re[k]! * b.re[k]! + a.im[k]! * b.im[k]!
    const im = a.im[k]! * b.re[k]! - a.re[k]! * b.im[k]!
    const angle = (Math.atan2(im, re) * 180) / Math.PI
    out[k] = angle === -180 ? 180 : angle
  }
  return out
}
