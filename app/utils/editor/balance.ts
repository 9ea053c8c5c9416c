import type { SolvedData } from '~~/app/workers/protocol'
import { amplitudeImbalance, phaseDifference as phaseDifferenceOver } from '~~/shared/rf'
import { phaseDifference, traceSamples, type TraceRef } from './traces'

/** Amplitude difference (dB, a over b) and phase difference (degrees, a minus b, wrapped) of two transmissions at every frequency. */
export function balance(r: SolvedData, a: TraceRef, b: TraceRef): { db: Float64Array, deg: Float64Array } {
  const sa = traceSamples(r, a)
  const sb = traceSamples(r, b)
  return { db: amplitudeImbalance(sa, sb), deg: phaseDifferenceOver(sa, sb) }
}

/** Largest distance from a target over the sweep (phase differences compared on the circle). */
export function worstDeviation(values: Float64Array, target: number, circular = false): number {
  let worst = 0
  for (const v of values) {
    const d = circular ? Math.abs(phaseDifference(v, target)) : Math.abs(v - target)
    if (Number.isFinite(d)) worst = Math.max(worst, d)
  }
  return worst
}
