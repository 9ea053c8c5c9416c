/** Which two transmissions the report's Balance plot compares, and the phase difference it aims at. */
import type { NetworkDocument } from '~~/shared/network/types'
import type { SnapshotSummary } from '~~/shared/review/snapshot-summary'
import { traceName } from '~~/app/utils/editor/traces'

/**
 * The summary's two strongest outputs from port 1 ("S21", "S31"), with the spec's phase-difference
 * target for them when it has one, else the measured difference at the centre rounded to the nearest
 * 90° (a quadrature or in-phase split); null when the network has fewer than three ports.
 */
export function reportBalancePair(doc: NetworkDocument, summary: SnapshotSummary): { a: string, b: string, targetDeg: number } | null {
  const pair = summary.balance
  if (!pair || !summary.ports) return null
  const a = traceName({ i: pair.a, j: pair.from }, summary.ports)
  const b = traceName({ i: pair.b, j: pair.from }, summary.ports)
  const condition = (doc.spec?.conditions ?? []).find(c => c.measure === 'phaseDifference' && c.from === pair.from && c.to[0] === pair.a && c.to[1] === pair.b)
  const targetDeg = condition?.measure === 'phaseDifference' ? condition.target : Math.round(pair.phaseDifferenceDeg / 90) * 90
  return { a, b, targetDeg }
}
