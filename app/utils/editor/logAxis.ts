/**
 * Ticks of a logarithmic frequency axis: every decade and the 2 and 5 between
 * (1-2-5), within exactly the sweep's span; a span shorter than that gets
 * 1…9 per decade, and one under a few of those gets evenly stepped ticks.
 */
import { formatSI } from './format'

const EPS = 1e-9

function within(v: number, min: number, max: number): boolean {
  return v >= min * (1 - EPS) && v <= max * (1 + EPS)
}

function mantissaTicks(min: number, max: number, mantissas: readonly number[]): number[] {
  const out: number[] = []
  for (let d = Math.floor(Math.log10(min)); d <= Math.ceil(Math.log10(max)); d++) {
    for (const m of mantissas) {
      const v = Number((m * 10 ** d).toPrecision(12))
      if (within(v, min, max)) out.push(v)
    }
  }
  return out
}

/** Evenly stepped ticks (a 1-2-5 step) for a span too short for decade marks. */
function steppedTicks(min: number, max: number, count = 5): number[] {
  const raw = (max - min) / count
  const p = 10 ** Math.floor(Math.log10(raw))
  const step = [1, 2, 5, 10].map(m => m * p).find(s => s >= raw) ?? 10 * p
  const out: number[] = []
  for (let v = Math.ceil(min / step - EPS) * step; v <= max * (1 + EPS); v += step) out.push(Number(v.toPrecision(12)))
  return out
}

/** Tick values (Hz) for a log axis from `min` to `max` (both > 0). */
export function logTicks(min: number, max: number): number[] {
  if (!(min > 0) || !(max > min)) return min > 0 ? [min] : []
  const decades = mantissaTicks(min, max, [1, 2, 5])
  if (decades.length >= 4) return decades
  const finer = mantissaTicks(min, max, [1, 2, 3, 4, 5, 6, 7, 8, 9])
  return finer.length >= 3 ? finer : steppedTicks(min, max)
}

/** Whether a tick is a decade (1, 10, 100 … × the unit): drawn with a stronger grid line. */
export function isDecade(value: number): boolean {
  const l = Math.log10(value)
  return Math.abs(l - Math.round(l)) < 1e-9
}

/** A frequency tick label with an SI prefix and no padding zeros: "10 MHz", "2.5 GHz". */
export function frequencyTickLabel(hz: number): string {
  const text = formatSI(hz, 'Hz', 3)
  return text.replace(/(\.\d*?)0+ /, '$1 ').replace(/\. /, ' ')
}
