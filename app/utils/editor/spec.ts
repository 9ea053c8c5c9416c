/**
 * The spec mask: at which frequencies a design meets return-loss, amplitude
 * balance and phase-difference limits, and the widest band where it does.
 */
import type { SolvedData } from '~~/app/workers/protocol'
import { balance } from './balance'
import { phaseDifference, traceSamples, type TraceRef } from './traces'

export interface SpecMask {
  /** Minimum return loss (dB) at every port in `ports`. */
  returnLossDb: number
  ports: number[]
  /** Two transmissions compared for balance; omitted to check match only. */
  pair?: { a: TraceRef, b: TraceRef }
  maxImbalanceDb: number
  targetPhaseDeg: number
  phaseToleranceDeg: number
}

/** Whether each sweep point meets the mask. */
export function specPasses(r: SolvedData, mask: SpecMask): boolean[] {
  const n = r.frequencies.length
  const pass = new Array<boolean>(n).fill(true)
  for (const p of mask.ports) {
    if (p < 1 || p > r.ports) continue
    const s = traceSamples(r, { i: p, j: p })
    for (let k = 0; k < n; k++) {
      const rl = -10 * Math.log10(s.re[k]! ** 2 + s.im[k]! ** 2)
      if (!(rl >= mask.returnLossDb)) pass[k] = false
    }
  }
  if (mask.pair) {
    const b = balance(r, mask.pair.a, mask.pair.b)
    for (let k = 0; k < n; k++) {
      if (!(Math.abs(b.db[k]!) <= mask.maxImbalanceDb)) pass[k] = false
      if (!(Math.abs(phaseDifference(b.deg[k]!, mask.targetPhaseDeg)) <= mask.phaseToleranceDeg)) pass[k] = false
    }
  }
  return pass
}

/** The widest run of passing points: its edge frequencies and fractional width (span over its centre); null when no point passes. */
export function widestBand(frequencies: ArrayLike<number>, pass: readonly boolean[]): { low: number, high: number, fractional: number } | null {
  let best: [number, number] | null = null
  let start = -1
  for (let k = 0; k <= pass.length; k++) {
    if (k < pass.length && pass[k]) {
      if (start < 0) start = k
      continue
    }
    if (start >= 0 && (!best || frequencies[k - 1]! - frequencies[start]! > frequencies[best[1]]! - frequencies[best[0]]!)) best = [start, k - 1]
    start = -1
  }
  if (!best) return null
  const low = frequencies[best[0]]!
  const high = frequencies[best[1]]!
  return { low, high, fractional: (high - low) / ((high + low) / 2) }
}
