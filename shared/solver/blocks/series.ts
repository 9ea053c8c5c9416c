import { checkRlc, RLC_PARAMS, rlcImpedance } from '../math/rlc'
import type { BlockModel } from '../types'

/** Series R-L-C between two terminals: S11 = Z/(Z + 2R0), S21 = 2R0/(Z + 2R0). */
export const seriesModel: BlockModel = {
  type: 'series',
  terminals: 2,
  description: 'Series R-L-C between two terminals (or open, short, matched)',
  params: RLC_PARAMS,
  check: checkRlc,
  create(values, context) {
    const r0 = context.referenceImpedance
    const z = new Float64Array(4)
    return {
      ok: true,
      instance: {
        terminals: 2,
        refs: Float64Array.of(r0, r0),
        reciprocal: true,
        constant: values.end !== undefined || (values.inductance === undefined && values.capacitance === undefined),
        fill(frequency, re, im) {
          rlcImpedance(values, r0, frequency, z)
          // With Z = num/den: S11 = num/(num + 2R0·den), S21 = 2R0·den/(num + 2R0·den).
          const qR = z[0]! + 2 * r0 * z[2]!, qI = z[1]! + 2 * r0 * z[3]!
          const qq = qR * qR + qI * qI
          const sR = (z[0]! * qR + z[1]! * qI) / qq, sI = (z[1]! * qR - z[0]! * qI) / qq
          const tnR = 2 * r0 * z[2]!, tnI = 2 * r0 * z[3]!
          const tR = (tnR * qR + tnI * qI) / qq, tI = (tnI * qR - tnR * qI) / qq
          re[0] = sR; im[0] = sI; re[3] = sR; im[3] = sI
          re[1] = tR; im[1] = tI; re[2] = tR; im[2] = tI
          return true
        },
      },
    }
  },
}
