import type { SParameterSet } from '../rf/types'
import { mirrorResidual } from './mirror-residual'
import { MIRROR_PAIRINGS } from './pairings'
import type { MirrorPairs } from './types'

// A residual below this is rounding: the network is mirrored about that pairing.
const SYMMETRIC_WITHIN = 1e-9

/**
 * The pairing about which a four-port's sweep is mirror-symmetric: the first of `MIRROR_PAIRINGS`
 * that holds to rounding (a branch-line holds for all three, and 1↔4, 2↔3 is the usual plane),
 * else the one with the smallest worst residual.
 */
export function bestPairing(data: SParameterSet): { pairs: MirrorPairs, residual: number } {
  let best = { pairs: MIRROR_PAIRINGS[0]!, residual: Infinity }
  for (const pairs of MIRROR_PAIRINGS) {
    let worst = 0
    for (let k = 0; k < data.frequencies.length; k++) worst = Math.max(worst, mirrorResidual(data.re, data.im, pairs, k * 16))
    if (worst < SYMMETRIC_WITHIN) return { pairs, residual: worst }
    if (worst < best.residual) best = { pairs, residual: worst }
  }
  return best
}
