/**
 * Marker readouts in the plotted quantity: dB (with the phase beneath), phase
 * in degrees, group delay with an SI prefix, VSWR as a ratio; and the
 * difference between two markers in the same terms.
 */
import { formatDb, formatDegrees, formatNumber, formatSI } from './format'
import { phaseDifference, type Quantity } from './traces'

/** One marker cell: the main value and, for dB, the phase beneath it. */
export interface ReadoutCell { main: string, sub?: string }

/** A value of `quantity` as the readout shows it. */
export function readoutText(quantity: Quantity, value: number): string {
  switch (quantity) {
    case 'db': return formatDb(value)
    case 'phase':
    case 'unwrapped': return formatDegrees(value)
    case 'delay': return formatSI(value, 's', 4)
    default: return Number.isFinite(value) ? formatNumber(value, 3) : '∞'
  }
}

/** Difference b − a of two readings of `quantity` (wrapped phase on the circle). */
export function deltaText(quantity: Quantity, a: number, b: number): string {
  const d = quantity === 'phase' ? phaseDifference(b, a) : b - a
  const text = readoutText(quantity, d)
  return Number.isFinite(d) && d > 0 ? `+${text}` : text
}
