import { microstripSweep } from '../../microstrip/analyse-microstrip'
import { C0 } from '../../microstrip/constants'
import { openEndRangeNotes } from '../../microstrip/discontinuity-range-notes'
import { openEndExtension } from '../../microstrip/open-end-extension'
import { staticMicrostrip } from '../../microstrip/static-microstrip'
import type { BlockModel } from '../types'

/**
 * Open end of a microstrip: its fringing field as a length extension Δl (Kirschning, Jansen & Koster,
 * Electronics Letters 1981), i.e. an open-ended line of length Δl with the line's Z0(f) and ε_eff(f).
 * Δl uses the static ε_eff, as in the paper. Γ is referred to the document's reference impedance
 * (fixed, while Z0 changes with frequency): Zin = −j·Z0/tan(βΔl), so Γ = (−jZ0 − R·τ)/(−jZ0 + R·τ), τ = tan βΔl.
 */
export const microstripOpenModel: BlockModel = {
  type: 'microstripOpen',
  terminals: 1,
  description: 'Open end of a microstrip (fringing as a length extension)',
  params: {
    substrate: { kind: 'text', required: true },
    width: { kind: 'length', required: true, above: 0 },
  },
  create(values, context) {
    const found = context.substrate(values.substrate as string)
    if (!found.ok) return { ok: false, problems: [{ field: 'substrate', message: found.message }] }
    const substrate = found.substrate
    const width = values.width as number
    const u = width / substrate.height
    const quasi = staticMicrostrip(u, substrate.thickness / substrate.height, substrate.permittivity)
    const extension = openEndExtension(u, substrate.permittivity, quasi.epsEff) * substrate.height
    const r = context.referenceImpedance
    const analyse = microstripSweep(substrate, width)
    return {
      ok: true,
      notes: openEndRangeNotes(u, substrate.permittivity),
      instance: {
        terminals: 1,
        refs: Float64Array.of(r),
        reciprocal: true,
        constant: false,
        fill(frequency, re, im) {
          const line = analyse(frequency)
          const tau = Math.tan((2 * Math.PI * frequency * Math.sqrt(line.epsEff) * extension) / C0)
          // (−jZ − Rτ)/(−jZ + Rτ): numerator n = (−Rτ, −Z), denominator d = (Rτ, −Z).
          const z = line.impedance, x = r * tau
          const dd = x * x + z * z
          re[0] = (-x * x + z * z) / dd
          im[0] = (-2 * x * z) / dd
          return true
        },
      },
    }
  },
}
