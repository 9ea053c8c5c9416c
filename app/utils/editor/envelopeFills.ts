import type { PlotFill } from './plotTypes'
import { withAlpha } from './tracePalette'

/** The spread of one trace (|S| in dB) over a yield run's trials, per sweep frequency. */
export interface YieldEnvelope {
  /** Trace name as the Response view writes it ("S21"). */
  trace: string
  frequencies: Float64Array
  min: Float64Array
  max: Float64Array
  /** 5th and 95th percentiles. */
  low: Float64Array
  high: Float64Array
  trials: number
  seed: number
}

/** Same sweep: the envelope's values sit on the plotted frequencies one for one. */
function sameSweep(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false
  for (let k = 0; k < a.length; k++) if (Math.abs(a[k]! - b[k]!) > 1e-6 * Math.max(1, Math.abs(b[k]!))) return false
  return true
}

/**
 * Shaded bands for the plotted traces that have an envelope over the same sweep: min–max faint, 5–95 % stronger,
 * each in its trace's colour. Traces without one, or recorded over another sweep, get none.
 */
export function envelopeFills(envelopes: readonly YieldEnvelope[], traces: ReadonlyArray<{ name: string; colour: string }>, frequencies: Float64Array): Array<PlotFill & { low: Float64Array; high: Float64Array }> {
  const fills: Array<PlotFill & { low: Float64Array; high: Float64Array }> = []
  for (const trace of traces) {
    const envelope = envelopes.find(e => e.trace === trace.name)
    if (!envelope || !sameSweep(envelope.frequencies, frequencies)) continue
    fills.push({ label: `${trace.name} min–max`, low: envelope.min, high: envelope.max, colour: withAlpha(trace.colour, 0.12) })
    fills.push({ label: `${trace.name} 5–95 %`, low: envelope.low, high: envelope.high, colour: withAlpha(trace.colour, 0.28) })
  }
  return fills
}
