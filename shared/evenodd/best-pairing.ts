import type { SParameterSet } from '../rf/types'
import { mirrorResidual } from './mirror-residual'
import { MIRROR_PAIRINGS } from './pairings'
import type { MirrorPairs } from './types'

/** The pairing about which a four-port's sweep is most nearly mirror-symmetric (smallest worst residual). */
export function bestPairing(data: SParameterSet): { pairs: MirrorPairs, residual: number } {
  let best = { pairs: MIRROR_PAIRINGS[0]!, residual: Infinity }
  for (const pairs of MIRROR_PAIRINGS) {
    let worst = 0
    for (let k = 0; k < data.frequencies.length; k++) worst = Math.max(worst, mirrorResidual(data.re, data.im, pairs, k * 16))
    if (worst < best.residual) best = { pairs, residual: worst }
  }
  return best
}
