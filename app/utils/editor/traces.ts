/**
 * Picking traces out of a solve result and turning them into plotted
 * quantities. A trace is one S-parameter, S(i)(j), 1-based.
 */
import type { SolvedData } from '~~/app/workers/protocol'

export interface TraceRef { i: number, j: number }
export type Quantity = 'db' | 'phase' | 'unwrapped' | 'delay' | 'vswr'

export const quantityLabels: Record<Quantity, string> = {
  db: 'Magnitude (dB)', phase: 'Phase (wrapped)', unwrapped: 'Phase (unwrapped)', delay: 'Group delay', vswr: 'VSWR',
}

/** "S21" (or "S10,2" once port numbers need two digits). */
export function traceName(t: TraceRef, ports: number): string {
  return ports > 9 ? `S${t.i},${t.j}` : `S${t.i}${t.j}`
}

/** Parse a trace name back; null when it does not fit the port count. */
export function parseTraceName(name: string, ports: number): TraceRef | null {
  const m = ports > 9 ? /^S(\d+),(\d+)$/.exec(name) : /^S(\d)(\d)$/.exec(name)
  if (!m) return null
  const t = { i: Number(m[1]), j: Number(m[2]) }
  return t.i >= 1 && t.j >= 1 && t.i <= ports && t.j <= ports ? t : null
}

/** Every trace of an N-port, row by row. */
export function allTraces(ports: number): string[] {
  const names: string[] = []
  for (let i = 1; i <= ports; i++) for (let j = 1; j <= ports; j++) names.push(traceName({ i, j }, ports))
  return names
}

/** A sensible first choice: input match and the transmissions from port 1. */
export function defaultTraces(ports: number): string[] {
  return Array.from({ length: Math.min(ports, 4) }, (_, k) => traceName({ i: k + 1, j: 1 }, ports))
}

/** Complex samples of one trace over frequency. */
export function traceSamples(r: SolvedData, t: TraceRef): { re: Float64Array, im: Float64Array } {
  const n = r.frequencies.length
  const re = new Float64Array(n)
  const im = new Float64Array(n)
  const p = r.ports
  for (let k = 0; k < n; k++) {
    const at = (k * p + (t.i - 1)) * p + (t.j - 1)
    re[k] = r.re[at]!
    im[k] = r.im[at]!
  }
  return { re, im }
}

/** 20·log10|S|. */
export function toDb(re: Float64Array, im: Float64Array): Float64Array {
  return re.map((x, k) => 10 * Math.log10(x * x + im[k]! * im[k]!))
}

/** Phase in degrees, wrapped to (−180°, 180°]. */
export function toPhaseDeg(re: Float64Array, im: Float64Array): Float64Array {
  return re.map((x, k) => (Math.atan2(im[k]!, x) * 180) / Math.PI)
}

/** Phase in degrees with 360° jumps between neighbouring points removed. */
export function unwrapDeg(wrapped: Float64Array): Float64Array {
  const out = new Float64Array(wrapped.length)
  let offset = 0
  for (let k = 0; k < wrapped.length; k++) {
    if (k > 0) {
      const step = wrapped[k]! - wrapped[k - 1]!
      if (step > 180) offset -= 360
      else if (step < -180) offset += 360
    }
    out[k] = wrapped[k]! + offset
  }
  return out
}

/** Group delay τ = −dφ/dω in seconds, by central differences of the unwrapped phase. */
export function groupDelay(frequencies: Float64Array, unwrappedDeg: Float64Array): Float64Array {
  const n = frequencies.length
  const out = new Float64Array(n).fill(Number.NaN)
  if (n < 2) return out
  for (let k = 0; k < n; k++) {
    const a = Math.max(0, k - 1)
    const b = Math.min(n - 1, k + 1)
    const dPhi = ((unwrappedDeg[b]! - unwrappedDeg[a]!) * Math.PI) / 180
    const dOmega = 2 * Math.PI * (frequencies[b]! - frequencies[a]!)
    out[k] = -dPhi / dOmega
  }
  return out
}

/** VSWR = (1 + |Γ|)/(1 − |Γ|); infinite for total reflection. */
export function toVswr(re: Float64Array, im: Float64Array): Float64Array {
  return re.map((x, k) => {
    const g = Math.hypot(x, im[k]!)
    return g >= 1 ? Number.POSITIVE_INFINITY : (1 + g) / (1 - g)
  })
}

/** One trace as the chosen quantity. */
export function traceQuantity(r: SolvedData, t: TraceRef, q: Quantity): Float64Array {
  const { re, im } = traceSamples(r, t)
  if (q === 'db') return toDb(re, im)
  if (q === 'vswr') return toVswr(re, im)
  const wrapped = toPhaseDeg(re, im)
  if (q === 'phase') return wrapped
  const unwrapped = unwrapDeg(wrapped)
  return q === 'unwrapped' ? unwrapped : groupDelay(r.frequencies, unwrapped)
}

/** Index of the sweep point nearest to `f` (frequencies ascending). */
export function nearestIndex(frequencies: ArrayLike<number>, f: number): number {
  let lo = 0
  let hi = frequencies.length - 1
  if (hi < 0) return -1
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1
    if (frequencies[mid]! < f) lo = mid
    else hi = mid
  }
  return Math.abs(frequencies[lo]! - f) <= Math.abs(frequencies[hi]! - f) ? lo : hi
}

/** Difference of two phases in degrees, wrapped to (−180°, 180°]. */
export function phaseDifference(a: number, b: number): number {
  let d = (a - b) % 360
  if (d <= -180) d += 360
  if (d > 180) d -= 360
  return d
}
