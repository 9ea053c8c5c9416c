import type { SnapshotSummary } from './snapshot-summary'

const MINUS = '\u2212'
const signed = (text: string) => (text.startsWith('-') ? MINUS + text.slice(1) : text)
const dB = (v: number) => `${signed(v.toFixed(2))} dB`
const deg = (v: number) => `${signed(v.toFixed(1))}°`

/** A frequency with an SI prefix, e.g. "2.450 GHz". */
export function formatHz(hz: number): string {
  const steps: Array<[number, string]> = [[1e9, 'GHz'], [1e6, 'MHz'], [1e3, 'kHz']]
  const [scale, unit] = steps.find(([s]) => Math.abs(hz) >= s) ?? [1, 'Hz']
  return `${(hz / scale).toFixed(3)} ${unit}`
}

/**
 * A snapshot summary as short lines of text, the same in the snapshot list and in e-mails:
 * centre, match per port, transmissions from port 1, balance, and the band meeting the spec.
 */
export function summaryLines(summary: SnapshotSummary): string[] {
  if (!summary.solved) return [`Not solved: ${summary.problem ?? 'unknown problem'}.`]
  const lines: string[] = []
  if (summary.centre) {
    const from = { spec: 'the spec', f0: 'the variable f0', sweep: 'the middle of the sweep' }[summary.centre.from]
    lines.push(`At ${formatHz(summary.centre.frequency)} (centre from ${from}), ${summary.ports}-port:`)
  }
  if (summary.returnLoss?.length) {
    lines.push(`Return loss: ${summary.returnLoss.map(r => `port ${r.port} ${r.db === null ? 'no reflection' : dB(r.db)}`).join(', ')}`)
  }
  if (summary.transfer?.length) {
    lines.push(`From port 1: ${summary.transfer.map(t => `S${t.to}${t.from} ${t.db === null ? 'no transmission' : `${dB(t.db)} at ${deg(t.phaseDeg)}`}`).join(', ')}`)
  }
  if (summary.balance) {
    const b = summary.balance
    lines.push(`Balance S${b.a}${b.from}/S${b.b}${b.from}: ${dB(b.imbalanceDb)} apart, ${deg(b.phaseDifferenceDeg)} phase difference`)
  }
  if (summary.bandwidth === null) lines.push('No spec, so no bandwidth.')
  else if (summary.bandwidth?.ok) {
    const w = summary.bandwidth
    lines.push(`Meets the spec from ${formatHz(w.low)} to ${formatHz(w.high)} (${(w.fractional * 100).toFixed(1)} % fractional bandwidth)`)
  } else if (summary.bandwidth) lines.push(`No band meets the spec: ${summary.bandwidth.reason}.`)
  return lines
}

/** The caution that goes with every exported or e-mailed presentation of results (same words as the app's footer). */
export const RF_SAFETY_CAUTION = 'Results are simulations — verify with measurement on a calibrated instrument. High RF power can burn '
  + 'and can exceed exposure limits; follow local exposure and licensing rules and defer to licensed practice.'
