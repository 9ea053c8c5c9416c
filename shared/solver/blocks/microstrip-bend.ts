import { bendParasitics } from '../../microstrip/bend-parasitics'
import { bendRangeNotes } from '../../microstrip/discontinuity-range-notes'
import { lumpedTeeS } from '../math/lumped-tee-s'
import type { BlockModel } from '../types'

/**
 * Right-angle bend of a microstrip, square or optimally mitred corner: series inductance in each arm and
 * shunt capacitance at the corner (closed forms in shared/microstrip/bend-parasitics.ts). Only the
 * parasitics: the lines up to the corner's reference planes are separate `microstrip` blocks.
 * S at the document's reference impedance.
 */
export const microstripBendModel: BlockModel = {
  type: 'microstripBend',
  terminals: 2,
  description: 'Right-angle bend of a microstrip, square or mitred corner (lumped parasitics)',
  params: {
    substrate: { kind: 'text', required: true },
    width: { kind: 'length', required: true, above: 0 },
    corner: { kind: 'choice', choices: ['square', 'mitred'], default: 'square' },
  },
  create(values, context) {
    const found = context.substrate(values.substrate as string)
    if (!found.ok) return { ok: false, problems: [{ field: 'substrate', message: found.message }] }
    const { height, permittivity } = found.substrate
    const width = values.width as number
    const corner = values.corner === 'mitred' ? 'mitred' : 'square'
    const { inductance, capacitance } = bendParasitics(width, height, permittivity, corner)
    const r = context.referenceImpedance
    return {
      ok: true,
      notes: bendRangeNotes(width / height, permittivity, corner),
      instance: {
        terminals: 2,
        refs: Float64Array.of(r, r),
        reciprocal: true,
        constant: false,
        fill(frequency, re, im) {
          lumpedTeeS(2 * Math.PI * frequency, inductance, capacitance, inductance, r, re, im)
          return true
        },
      },
    }
  },
}
