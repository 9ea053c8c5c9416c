/**
 * Value axes of the Response plot. An ideal match (|S| = 0, "−317 dB" in
 * floating point) or a transmission zero would stretch a plain autoscaled
 * axis until every other trace is a flat line at the top, so the axis of
 * each quantity has a sensible span and the points outside it are drawn
 * clipped at its edge (the marker readout keeps the true value).
 */
import type { Quantity } from './traces'

export interface AxisRange { min: number, max: number }

/** What the user typed for the axis; a missing end is chosen automatically. */
export interface UserRange { min?: number, max?: number }

/** Grid step of a dB axis: its top and bottom sit on multiples of it. */
export const DB_STEP = 10
/** How far below its top a dB axis reaches at most. */
export const DB_SPAN = 80
/** Highest VSWR the axis shows (VSWR 10 is a return loss of 1.74 dB: anything above is "badly mismatched"). */
export const VSWR_CAP = 10
/** Share of points a group-delay axis must show whole; the rest (spikes at transmission zeros) is clipped. */
export const DELAY_KEEP = 0.96

function finiteExtent(series: ReadonlyArray<ArrayLike<number>>): { lo: number, hi: number } | null {
  let lo = Number.POSITIVE_INFINITY
  let hi = Number.NEGATIVE_INFINITY
  for (const values of series) {
    for (let k = 0; k < values.length; k++) {
      const v = values[k]!
      if (!Number.isFinite(v)) continue
      if (v < lo) lo = v
      if (v > hi) hi = v
    }
  }
  return lo <= hi ? { lo, hi } : null
}

/** Apply what the user set; an inverted or empty pair falls back to the automatic end. */
function withUser(auto: AxisRange, user?: UserRange): AxisRange {
  const min = user?.min !== undefined && Number.isFinite(user.min) ? user.min : auto.min
  const max = user?.max !== undefined && Number.isFinite(user.max) ? user.max : auto.max
  return min < max ? { min, max } : auto
}

/**
 * A dB axis: the top is the highest value rounded up to a multiple of `step`;
 * the bottom is the lowest value rounded down, but no more than `span` below
 * the top. −∞ dB (a perfect null) counts as below any floor.
 */
export function dbAxisRange(series: ReadonlyArray<ArrayLike<number>>, options: { step?: number, span?: number, user?: UserRange } = {}): AxisRange {
  const step = options.step ?? DB_STEP
  const span = options.span ?? DB_SPAN
  const extent = finiteExtent(series)
  if (!extent) return withUser({ min: -span, max: 0 }, options.user)
  const max = Math.ceil(extent.hi / step) * step + 0 // + 0 turns −0 into 0
  let min = Math.max(Math.floor(extent.lo / step) * step, max - span) + 0
  if (min >= max) min = max - step
  return withUser({ min, max }, options.user)
}

/** A VSWR axis from 1 up to the highest value rounded up to a whole number, but no higher than `cap`. */
export function vswrAxisRange(series: ReadonlyArray<ArrayLike<number>>, options: { cap?: number, user?: UserRange } = {}): AxisRange {
  const cap = options.cap ?? VSWR_CAP
  let hi = 1
  // +∞ (total reflection) counts and lands on the cap; NaN compares false and is skipped.
  for (const values of series) for (let k = 0; k < values.length; k++) if (values[k]! > hi) hi = values[k]!
  const max = Math.min(cap, Math.max(2, Math.ceil(hi)))
  return withUser({ min: 1, max }, options.user)
}

/** The value below which a share `p` (0…1) of the sorted values lie, by linear interpolation. */
function quantile(sorted: Float64Array, p: number): number {
  const at = (sorted.length - 1) * p
  const lo = Math.floor(at)
  const hi = Math.min(lo + 1, sorted.length - 1)
  return sorted[lo]! + (sorted[hi]! - sorted[lo]!) * (at - lo)
}

/**
 * A group-delay axis that shows the central `keep` share of all points whole
 * and clips the rest: delay spikes where a transmission vanishes are real but
 * would otherwise flatten the passband. When no spike sticks out (the extreme
 * values lie within the central band's own height of it), the full extent is shown.
 */
export function delayAxisRange(series: ReadonlyArray<ArrayLike<number>>, options: { keep?: number, user?: UserRange } = {}): AxisRange {
  const keep = options.keep ?? DELAY_KEEP
  const all: number[] = []
  for (const values of series) for (let k = 0; k < values.length; k++) if (Number.isFinite(values[k]!)) all.push(values[k]!)
  if (!all.length) return withUser({ min: 0, max: 1e-9 }, options.user)
  const sorted = Float64Array.from(all).sort()
  const full = { lo: sorted[0]!, hi: sorted[sorted.length - 1]! }
  const lo = quantile(sorted, (1 - keep) / 2)
  const hi = quantile(sorted, 1 - (1 - keep) / 2)
  const band = Math.max(hi - lo, Math.abs(hi) * 1e-3, 1e-15)
  const min = full.lo >= lo - band ? full.lo : lo - band / 2
  const max = full.hi <= hi + band ? full.hi : hi + band / 2
  const pad = (max - min) * 0.05 || Math.abs(max) * 0.05 || 1e-12
  return withUser({ min: min - pad, max: max + pad }, options.user)
}

/** The axis of one Response quantity, or null for phase (whose wrapped and unwrapped forms autoscale well). */
export function responseAxisRange(quantity: Quantity, series: ReadonlyArray<ArrayLike<number>>, user?: UserRange): AxisRange | null {
  if (quantity === 'db') return dbAxisRange(series, { user })
  if (quantity === 'vswr') return vswrAxisRange(series, { user })
  if (quantity === 'delay') return delayAxisRange(series, { user })
  if (user && (user.min !== undefined || user.max !== undefined)) {
    const extent = finiteExtent(series) ?? { lo: -180, hi: 180 }
    return withUser({ min: extent.lo, max: extent.hi > extent.lo ? extent.hi : extent.lo + 1 }, user)
  }
  return null
}

/**
 * Values as drawn on an axis: anything beyond an edge (±∞ included) sits on
 * that edge; NaN (or null) stays a gap, as NaN. A typed array: an array mixing
 * numbers and nulls would box every number, a garbage heap per redrawn trace.
 */
export function clipToRange(values: ArrayLike<number | null>, range: AxisRange): Float64Array {
  const out = new Float64Array(values.length)
  for (let k = 0; k < values.length; k++) {
    const v = values[k]
    out[k] = v === null || v === undefined || Number.isNaN(v) ? Number.NaN : v < range.min ? range.min : v > range.max ? range.max : v
  }
  return out
}
