import { C0 } from '../../microstrip/constants'
import { stepRangeNotes } from '../../microstrip/discontinuity-range-notes'
import { staticMicrostrip } from '../../microstrip/static-microstrip'
import { stepParasitics } from '../../microstrip/step-parasitics'
import type { BlockModel } from '../types'
import { abcdToS } from '../math/abcd-to-s'

/**
 * Step in width between two microstrips, `width1` at terminal 1 and `width2` at terminal 2: series
 * inductance split between the sides in proportion to their inductance per length, L_i = Z0_i·√ε_eff,i/c,
 * with the shunt capacitance between (Gupta, Garg, Bahl & Bhartia, "Microstrip Lines and Slotlines",
 * 2nd ed., §3.4 [memory]). The change of impedance itself belongs to the lines on either side; this block
 * holds only the parasitics, so equal widths give a through connection. S at the document's reference.
 */
export const microstripStepModel: BlockModel = {
  type: 'microstripStep',
  terminals: 2,
  description: 'Step in width between two microstrips (lumped parasitics)',
  params: {
    substrate: { kind: 'text', required: true },
    width1: { kind: 'length', required: true, above: 0 },
    width2: { kind: 'length', required: true, above: 0 },
  },
  create(values, context) {
    const found = context.substrate(values.substrate as string)
    if (!found.ok) return { ok: false, problems: [{ field: 'substrate', message: found.message }] }
    const { height, thickness, permittivity } = found.substrate
    const w1 = values.width1 as number, w2 = values.width2 as number
    const wide = Math.max(w1, w2), narrow = Math.min(w1, w2)
    const { inductance, capacitance } = stepParasitics(wide, narrow, height, permittivity)
    const perLength = (w: number) => {
      const line = staticMicrostrip(w / height, thickness / height, permittivity)
      return (line.impedance * Math.sqrt(line.epsEff)) / C0
    }
    const l1 = perLength(w1), l2 = perLength(w2)
    const la = (inductance * l1) / (l1 + l2), lb = (inductance * l2) / (l1 + l2)
    const r = context.referenceImpedance
    const abcd = new Float64Array(8), s = new Float64Array(8)
    return {
      ok: true,
      notes: stepRangeNotes(wide, narrow, height, permittivity),
      instance: {
        terminals: 2,
        refs: Float64Array.of(r, r),
        reciprocal: true,
        constant: false,
        fill(frequency, re, im) {
          // Series jωLa, shunt jωC, series jωLb: A = 1 − ω²LaC, B = jω(La + Lb − ω²LaLbC), C = jωC, D = 1 − ω²LbC.
          const w = 2 * Math.PI * frequency
          abcd.fill(0)
          abcd[0] = 1 - w * w * la * capacitance
          abcd[3] = w * (la + lb - w * w * la * lb * capacitance)
          abcd[5] = w * capacitance
          abcd[6] = 1 - w * w * lb * capacitance
          abcdToS(abcd, r, r, s)
          for (let e = 0; e < 4; e++) {
            re[e] = s[2 * e]!
            im[e] = s[2 * e + 1]!
          }
          return true
        },
      },
    }
  },
}
