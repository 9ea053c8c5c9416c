import { microstripSweep } from '../../microstrip/analyse-microstrip'
import { C0 } from '../../microstrip/constants'
import { microstripRangeNotes } from '../../microstrip/range-notes'
import { abcdToS } from '../math/abcd-to-s'
import { lossyLineAbcd } from '../math/lossy-line-abcd'
import type { BlockModel } from '../types'

/**
 * Microstrip line on a named substrate: Hammerstad–Jensen static model, Kirschning–Jansen dispersion
 * of ε_eff and Jansen–Kirschning dispersion of Z0, conductor loss (Hammerstad–Jensen, with
 * Hammerstad–Bekkadal roughness) and dielectric loss (see shared/microstrip).
 *
 * S is referred to the document's reference impedance at both terminals, not to the line's own Z0(f):
 * a block's references are fixed while Z0 changes with frequency, so the line's ABCD with Z0(f) and
 * γ(f) is converted to S at a fixed reference, which is exact. Lines and ports at that reference then
 * join without renormalising. The line impedance is taken as real (a low-loss line).
 */
export const microstripModel: BlockModel = {
  type: 'microstrip',
  terminals: 2,
  description: 'Microstrip line on a named substrate, with dispersion and loss',
  params: {
    substrate: { kind: 'text', required: true },
    width: { kind: 'length', required: true, above: 0 },
    length: { kind: 'length', required: true, min: 0 },
  },
  create(values, context) {
    const found = context.substrate(values.substrate as string)
    if (!found.ok) return { ok: false, problems: [{ field: 'substrate', message: found.message }] }
    const substrate = found.substrate
    const width = values.width as number, length = values.length as number
    const reference = context.referenceImpedance
    const abcd = new Float64Array(8), s = new Float64Array(8)
    const analyse = microstripSweep(substrate, width)
    return {
      ok: true,
      notes: microstripRangeNotes(width / substrate.height, substrate.permittivity, substrate.height),
      instance: {
        terminals: 2,
        refs: Float64Array.of(reference, reference),
        reciprocal: true,
        constant: false,
        shareKey: `microstrip:${JSON.stringify(substrate)}:${width}:${length}:${reference}`,
        fill(frequency, re, im) {
          const line = analyse(frequency)
          const radians = (2 * Math.PI * frequency * Math.sqrt(line.epsEff) * length) / C0
          const nepers = (line.conductorLoss + line.dielectricLoss) * length
          abcdToS(lossyLineAbcd(line.impedance, nepers, radians, abcd), reference, reference, s)
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
