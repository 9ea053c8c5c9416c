/** CSV of plotted traces: one row per frequency, the values as plotted with their units in the header. */
import { SAFETY_NOTE } from '~~/shared/solver/safety-note'

/** One column: a trace as plotted ("S21", unit "dB"). */
export interface CsvColumn {
  label: string
  /** Unit written in the header; '' for unitless values (VSWR). */
  unit: string
  values: ArrayLike<number | null>
}

/** A CSV field, quoted when it holds a comma, quote or line break (RFC 4180). */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text
}

const header = (label: string, unit: string) => csvField(unit ? `${label} (${unit})` : label)

/**
 * The traces as CSV: a first comment line with the simulated-results caution, a header
 * "Frequency (Hz),S11 (dB),…", then one row per frequency. Numbers are written so they read
 * back exactly; a value that is not finite (a null, −∞ dB) is left empty.
 */
export function tracesCsv(frequencies: ArrayLike<number>, columns: readonly CsvColumn[]): string {
  const lines = [`# ${SAFETY_NOTE}`, [header('Frequency', 'Hz'), ...columns.map(c => header(c.label, c.unit))].join(',')]
  for (let k = 0; k < frequencies.length; k++) {
    const cells = [String(frequencies[k])]
    for (const c of columns) {
      const v = c.values[k]
      cells.push(v !== null && v !== undefined && Number.isFinite(v) ? String(v) : '')
    }
    lines.push(cells.join(','))
  }
  return `${lines.join('\r\n')}\r\n`
}
