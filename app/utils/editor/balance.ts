import type { SolvedData } from '~~/app/workers/protocol'
import { phaseDifference, traceSamples, type TraceRef } from './traces'

/** Amplitude difference (dB, a over b) and phase difference (degrees, a minus b, wrapped) of two transmissions at every frequency. */
export function balance(r: SolvedData, a: TraceRef, b: TraceRef): { db: Float64Array, deg: Float64Array } {
  const sa = traceSamples(r, a)
  const sb = traceSamples(r, b)
  const n = r.frequencies.length
  const db = new Float64Array(n)
  const deg = new Float64Array(n)
  for (let k = 0; k < n; k++) {
    const pa = sa.re[k]! ** 2 + sa.im[k]! ** 2
    const pb = sb.re[k]! ** 2 + sb.im[k]! ** 2
    db[k] = 10 * Math.log10(pa / pb)
    const da = (Math.atan2(sa.im[k]!, sa.re[k]!) * 180) / Math.PI
    const dbb = (Math.atan2(sb.im[k]!, sb.re[k]!) * 180) / Math.PI
    deg[k] = phaseDifference(da, dbb)
  }
  return { db, deg }
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
