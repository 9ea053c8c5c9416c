import { halfSumDifference } from './mirror-decompose'
import type { MirrorPairs, ModePair, TwoPortS } from './types'

/**
 * The full 4×4 S (row-major re/im, 16 each) of a mirror-symmetric four-port from its half
 * circuits: S_pp = (Γe + Γo)/2, S_p'p = (Γe − Γo)/2, S_qp = (Te + To)/2, S_q'p = (Te − To)/2
 * (Pozar, Microwave Engineering, 4th ed., §7.5 [memory]), and the mirror images of each.
 */
export function mirrorCombine(modes: ModePair, pairs: MirrorPairs): { re: Float64Array, im: Float64Array } {
  const re = new Float64Array(16), im = new Float64Array(16)
  const [[p, pm], [q, qm]] = pairs
  const side = [p, q], mirror = [pm, qm]
  const key: Array<keyof TwoPortS> = ['s11', 's12', 's21', 's22']
  const set = (to: number, from: number, v: { re: number, im: number }) => {
    re[(to - 1) * 4 + from - 1] = v.re
    im[(to - 1) * 4 + from - 1] = v.im
  }
  for (let a = 0; a < 2; a++) {
    for (let b = 0; b < 2; b++) {
      const k = key[a * 2 + b]!
      const [same, across] = halfSumDifference(modes.even[k], modes.odd[k])
      set(side[a]!, side[b]!, same)
      set(mirror[a]!, mirror[b]!, same)
      set(mirror[a]!, side[b]!, across)
      set(side[a]!, mirror[b]!, across)
    }
  }
  return { re, im }
}
