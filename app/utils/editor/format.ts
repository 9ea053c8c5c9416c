/** Readout formatting: SI prefixes, a true minus sign, units always shown. */

const MINUS = '\u2212'
const prefixes: Array<[number, string]> = [
  [1e12, 'T'], [1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'], [1e-12, 'p'], [1e-15, 'f'],
]

function signed(text: string): string {
  return text.startsWith('-') ? MINUS + text.slice(1) : text
}

/** A value in SI base units with the prefix that keeps 1 ≤ |mantissa| < 1000, e.g. "2.450 GHz". */
export function formatSI(value: number, unit: string, digits = 4): string {
  if (!Number.isFinite(value)) return `— ${unit}`.trim()
  if (value === 0) return `0 ${unit}`.trim()
  const abs = Math.abs(value)
  const [scale, prefix] = prefixes.find(([s]) => abs >= s * 0.99995) ?? prefixes[prefixes.length - 1]!
  const mantissa = value / scale
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(mantissa) || 1)))
  return `${signed(mantissa.toFixed(decimals))} ${prefix}${unit}`.trim()
}

/** A frequency in hertz, e.g. "2.450 GHz". */
export function formatFrequency(hz: number): string {
  return formatSI(hz, 'Hz', 4)
}

/** Decibels with two decimals, e.g. "−3.01 dB". */
export function formatDb(db: number): string {
  return Number.isFinite(db) ? `${signed(db.toFixed(2))} dB` : '−∞ dB'
}

/** Degrees with one decimal, e.g. "−90.0°". */
export function formatDegrees(deg: number): string {
  return Number.isFinite(deg) ? `${signed(deg.toFixed(1))}°` : '—'
}

/** Plain number with a true minus sign. */
export function formatNumber(value: number, decimals = 3): string {
  return Number.isFinite(value) ? signed(value.toFixed(decimals)) : '—'
}

/** Pick SI scale for an axis whose values span up to `max` (uPlot tick labels). */
export function axisScale(max: number): { scale: number, prefix: string } {
  const abs = Math.abs(max)
  const [scale, prefix] = prefixes.find(([s]) => abs >= s) ?? [1, '']
  return { scale, prefix }
}

/** Units read as plain numbers on an axis: nobody says "500 mdB" or "1.5 k°". */
const PLAIN_UNITS = new Set(['dB', '°', ''])

/**
 * An axis tick label. dB, degrees and unitless values are plain numbers with as
 * many decimals as the tick spacing `increment` needs ("−0.5 dB", "−90°", "1.5");
 * other units get SI prefixes ("2.40 GHz", "1.50 ns").
 */
export function formatTick(value: number, unit: string, increment: number): string {
  if (!PLAIN_UNITS.has(unit)) return formatSI(value, unit, 3)
  let decimals = 0
  if (Number.isFinite(increment) && increment > 0) {
    // As many decimals as the spacing itself has (0.25 → 2, 0.5 → 1, 10 → 0).
    while (decimals < 6 && Math.abs(Math.round(increment * 10 ** decimals) - increment * 10 ** decimals) > 1e-6 * 10 ** decimals) decimals++
  }
  const text = signed(value.toFixed(decimals)).replace(/^\u2212(0(\.0+)?)$/, '$1')
  return unit === '°' ? `${text}°` : `${text} ${unit}`.trim()
}
