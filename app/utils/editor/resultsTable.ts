import type { SolvedData } from '~~/app/workers/protocol'
import { magnitudeDb, phaseDeg } from '~~/shared/rf'
import { parseTraceName, traceSamples } from './traces'

/** Columns and rows of the results table: frequency, then magnitude (dB) and phase (°) of each trace. */
export function resultsTable(r: SolvedData, traces: string[]): { header: string[], rows: number[][] } {
  const cols = traces.flatMap((name) => {
    const t = parseTraceName(name, r.ports)
    if (!t) return []
    const s = traceSamples(r, t)
    return [{ head: `${name} dB`, values: magnitudeDb(s) }, { head: `${name} deg`, values: phaseDeg(s) }]
  })
  const rows = Array.from(r.frequencies, (f, k) => [f, ...cols.map(c => c.values[k]!)])
  return { header: ['Frequency (Hz)', ...cols.map(c => c.head)], rows }
}

/** Tab-separated text of a table (pastes into spreadsheets as columns). */
export function toTsv(header: string[], rows: ReadonlyArray<ReadonlyArray<number | string>>): string {
  const line = (cells: ReadonlyArray<number | string>) => cells.map(c => (typeof c === 'number' ? (Number.isFinite(c) ? String(c) : '') : c)).join('\t')
  return [line(header), ...rows.map(line)].join('\n') + '\n'
}
