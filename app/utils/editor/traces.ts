/**
 * Picking traces out of a solve result and turning them into plotted
 * quantities. A trace is one S-parameter, S(i)(j), 1-based.
 */
import type { SolvedData } from '~~/app/workers/protocol'
import { groupDelay, magnitudeDb, phaseDeg, unwrapPhaseDeg, vswr } from '~~/shared/rf'

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

/**
 * A first choice that fits the network: up to 4 ports, everything from port 1
 * (input match and every transmission); beyond, the reflections of every port
 * plus the first input to every output.
 */
export function defaultTraces(ports: number): string[] {
  if (ports <= 4) return Array.from({ length: ports }, (_, k) => traceName({ i: k + 1, j: 1 }, ports))
  const reflections = Array.from({ length: ports }, (_, k) => traceName({ i: k + 1, j: k + 1 }, ports))
  const fromFirst = Array.from({ length: ports - 1 }, (_, k) => traceName({ i: k + 2, j: 1 }, ports))
  return [...reflections, ...fromFirst]
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

/** One trace as the chosen quantity. */
export function traceQuantity(r: SolvedData, t: TraceRef, q: Quantity): Float64Array {
  const s = traceSamples(r, t)
  if (q === 'db') return magnitudeDb(s)
  if (q === 'vswr') return vswr(s)
  if (q === 'delay') return groupDelay(s, r.frequencies)
  const wrapped = phaseDeg(s)
  return q === 'phase' ? wrapped : unwrapPhaseDeg(wrapped)
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

/** Difference of two phases in degrees, wrapped to (−180°, 180°] (for single readout values). */
export function phaseDifference(a: number, b: number): number {
  let d = (a - b) % 360
  if (d <= -180) d += 360
  if (d > 180) d -= 360
  return d
}
