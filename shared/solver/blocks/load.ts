import { checkRlc, RLC_PARAMS, rlcImpedance } from '../math/rlc'
import type { BlockModel } from '../types'

/** Series R-L-C (or open/short/matched) from its terminal to ground. */
export const loadModel: BlockModel = {
  type: 'load',
  terminals: 1,
  description: 'One-terminal load to ground: series R-L-C, or open, short or matched',
  params: RLC_PARAMS,
  check: checkRlc,
  create(values, context) {
    const r0 = context.referenceImpedance
    const z = new Float64Array(4)
    return {
      ok: true,
      instance: {
        terminals: 1,
        refs: Float64Array.of(r0),
        reciprocal: true,
        constant: values.end !== undefined || (values.inductance === undefined && values.capacitance === undefined),
        fill(frequency, re, im) {
          rlcImpedance(values, r0, frequency, z)
          // Γ = (Z − R0)/(Z + R0) with Z = num/den: (num − R0·den)/(num + R0·den).
          const pR = z[0]! - r0 * z[2]!, pI = z[1]! - r0 * z[3]!
          const qR = z[0]! + r0 * z[2]!, qI = z[1]! + r0 * z[3]!
          const qq = qR * qR + qI * qI
          re[0] = (pR * qR + pI * qI) / qq
          im[0] = (pI * qR - pR * qI) / qq
          return true
        },
      },
    }
  },
}
