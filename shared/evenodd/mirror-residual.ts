import { mirrorCombine } from './mirror-combine'
import { mirrorDecompose } from './mirror-decompose'
import type { MirrorPairs } from './types'

/**
 * Largest |S_full − S_recombined| over the 16 entries when the full S (row-major re/im from
 * offset `at`) is split into half circuits about `pairs` and put back together: about 1e-15
 * for a network that is mirror-symmetric about that plane, of order |S| when it is not.
 */
export function mirrorResidual(re: ArrayLike<number>, im: ArrayLike<number>, pairs: MirrorPairs, at = 0): number {
  const back = mirrorCombine(mirrorDecompose(re, im, pairs, at), pairs)
  let worst = 0
  for (let k = 0; k < 16; k++) worst = Math.max(worst, Math.hypot(re[at + k]! - back.re[k]!, im[at + k]! - back.im[k]!))
  return worst
}
