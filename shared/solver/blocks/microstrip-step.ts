import { C0 } from '../../microstrip/constants'
import { stepRangeNotes } from '../../microstrip/discontinuity-range-notes'
import { staticMicrostrip } from '../../microstrip/static-microstrip'
import { stepParasitics } from '../../microstrip/step-parasitics'
import { lumpedTeeS } from '../math/lumped-tee-s'
import type { BlockModel } from '../types'

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
    return {
      ok: true,
      notes: stepRangeNotes(wide, narrow, height, permittivity),
      instance: {
        terminals: 2,
        refs: Float64Array.of(r, r),
        reciprocal: true,
        constant: false,
        fill(frequency, re, im) {
          lumpedTeeS(2 * Math.PI * frequency, la, capacitance, lb, r, re, im)
          return true
        },
      },
    }
  },
}
