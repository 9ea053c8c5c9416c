/** Readouts of complex values for the even/odd view. */
import type { Complex } from '~~/shared/evenodd/index'

const minus = (s: string) => s.replace('-', '−')

/** "0.500 − 0.707j" with three decimals (a true minus sign; "—" when not finite). */
export function formatComplex(z: Complex, decimals = 3): string {
  if (!Number.isFinite(z.re) || !Number.isFinite(z.im)) return '—'
  const re = Math.abs(z.re) < 0.5 * 10 ** -decimals ? 0 : z.re
  const im = Math.abs(z.im) < 0.5 * 10 ** -decimals ? 0 : z.im
  return `${minus(re.toFixed(decimals))} ${im < 0 ? '−' : '+'} ${Math.abs(im).toFixed(decimals)}j`
}

/** Magnitude in dB and angle in degrees of a complex value, e.g. "−3.01 dB ∠ −90.0°". */
export function formatPolar(z: Complex): string {
  const mag = Math.hypot(z.re, z.im)
  if (mag < 1e-12) return '0 (−∞ dB)'
  const db = 20 * Math.log10(mag)
  const deg = (Math.atan2(z.im, z.re) * 180) / Math.PI
  return `${minus(db.toFixed(2))} dB ∠ ${minus(deg.toFixed(1))}°`
}

/** A small difference as "3.3e−16" (or "0"). */
export function formatDifference(x: number): string {
  if (x === 0) return '0'
  return minus(x.toExponential(1)).replace('e-', 'e−').replace('e+', 'e')
}
