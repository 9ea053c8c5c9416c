import { add, scale, sub } from './complex'
import type { Complex, MirrorPairs, ModePair } from './types'

/** Entry S(to, from) of a row-major 4×4 held as re/im arrays (ports from 1), from offset `at`. */
function entry(re: ArrayLike<number>, im: ArrayLike<number>, to: number, from: number, at = 0): Complex {
  const k = at + (to - 1) * 4 + from - 1
  return { re: re[k]!, im: im[k]! }
}

/**
 * Even- and odd-mode half circuits of a four-port symmetric about a plane, from its full S.
 * Exciting p and p' with equal (even) or opposite (odd) waves of ½ gives, for the half circuit
 * with ports p → 1 and q → 2 (Pozar, Microwave Engineering, 4th ed., §7.5, eqs. 7.51–7.56 [memory];
 * derived by hand for a general pairing):
 *   Γe = S_pp + S_p'p,  Te = S_qp + S_q'p,  Γo = S_pp − S_p'p,  To = S_qp − S_q'p,
 * and from port q likewise. For a network that is not mirror-symmetric the result is the
 * mode content of column p and q only; `mirrorResidual` says how far the network is from symmetric.
 */
export function mirrorDecompose(re: ArrayLike<number>, im: ArrayLike<number>, pairs: MirrorPairs, at = 0): ModePair {
  const [[p, pm], [q, qm]] = pairs
  const s = (to: number, from: number) => entry(re, im, to, from, at)
  const half = (sign: 1 | -1) => {
    const mix = (a: Complex, b: Complex) => (sign > 0 ? add(a, b) : sub(a, b))
    return {
      s11: mix(s(p, p), s(pm, p)),
      s21: mix(s(q, p), s(qm, p)),
      s12: mix(s(p, q), s(pm, q)),
      s22: mix(s(q, q), s(qm, q)),
    }
  }
  return { even: half(1), odd: half(-1) }
}

/** Half the sum and half the difference of two complex values: how modes combine into ports. */
export function halfSumDifference(e: Complex, o: Complex): [Complex, Complex] {
  return [scale(add(e, o), 0.5), scale(sub(e, o), 0.5)]
}
