import { microstripSweep } from '../../microstrip/analyse-microstrip'
import { C0 } from '../../microstrip/constants'
import { coupledMicrostripStatic } from '../../microstrip/coupled-static'
import { coupledRangeNotes } from '../../microstrip/discontinuity-range-notes'
import type { MicrostripSubstrate } from '../../microstrip/types'
import { fillDoublySymmetric } from '../math/four-port'
import type { BlockModel } from '../types'
import { uniformLine } from './coupled'

/** Frequency (Hz) where a single strip's ε_eff(f) has risen 2 % above its static value (bisection in log f). */
function quasiStaticLimit(substrate: MicrostripSubstrate, width: number): number {
  const line = microstripSweep(substrate, width)
  const rise = (f: number) => line(f).epsEff / line(0).epsEff - 1
  let lo = 1e6, hi = 1e13
  if (rise(hi) < 0.02) return hi
  for (let i = 0; i < 60; i++) {
    const mid = Math.sqrt(lo * hi)
    if (rise(mid) < 0.02) lo = mid
    else hi = mid
  }
  return lo
}

/**
 * Two coupled microstrips of `width` and `gap` on a substrate, `length` long (Portwright's extension):
 * 1 in, 2 through (same strip), 3 coupled (beside 1), 4 isolated (beside 2), as the `coupled` block.
 * Even and odd modes from the quasi-static model of Garg & Bahl 1979 (shared/microstrip/coupled-static.ts),
 * each a lossless line of its own impedance and phase velocity, so unequal ε_eff of the modes shows
 * as the limited isolation of a real microstrip coupler. Strip thickness is not modelled. S at the
 * document's reference impedance.
 */
export const coupledMicrostripModel: BlockModel = {
  type: 'coupledMicrostrip',
  terminals: 4,
  description: 'Coupled microstrips on a named substrate (quasi-static even and odd modes)',
  params: {
    substrate: { kind: 'text', required: true },
    width: { kind: 'length', required: true, above: 0 },
    gap: { kind: 'length', required: true, above: 0 },
    length: { kind: 'length', required: true, min: 0 },
  },
  create(values, context) {
    const found = context.substrate(values.substrate as string)
    if (!found.ok) return { ok: false, problems: [{ field: 'substrate', message: found.message }] }
    const substrate = found.substrate
    const width = values.width as number, gap = values.gap as number, length = values.length as number
    const u = width / substrate.height, g = gap / substrate.height
    const modes = coupledMicrostripStatic(u, g, substrate.permittivity)
    const r = context.referenceImpedance
    const even = new Float64Array(4), odd = new Float64Array(4), v = new Float64Array(8)
    const k = (2 * Math.PI * length) / C0
    return {
      ok: true,
      notes: coupledRangeNotes(u, g, quasiStaticLimit(substrate, width)),
      instance: {
        terminals: 4,
        refs: Float64Array.of(r, r, r, r),
        reciprocal: true,
        constant: false,
        shareKey: `coupledMicrostrip:${JSON.stringify(substrate)}:${width}:${gap}:${length}:${r}`,
        fill(frequency, re, im) {
          uniformLine(modes.evenImpedance / r, k * frequency * Math.sqrt(modes.evenEpsEff), 0, even)
          uniformLine(modes.oddImpedance / r, k * frequency * Math.sqrt(modes.oddEpsEff), 0, odd)
          // S11 = (Γe + Γo)/2, S21 = (Te + To)/2, S31 = (Γe − Γo)/2, S41 = (Te − To)/2.
          for (let e = 0; e < 4; e++) {
            v[e] = (even[e]! + odd[e]!) / 2
            v[4 + e] = (even[e]! - odd[e]!) / 2
          }
          fillDoublySymmetric(v, re, im)
          return true
        },
      },
    }
  },
}
