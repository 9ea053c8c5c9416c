import type { SpecCondition } from '../rf/spec-mask'
import { findBandwidth } from '../rf/find-bandwidth'
import type { NetworkDocument } from '../network/types'
import { solveDocument } from '../solver/index'

/**
 * Middle (Hz) of the band around f0 over which a designed document meets every condition of its spec,
 * solved over f0·(1 ± span); undefined when f0 itself fails (there is then no band to centre).
 */
export function specBandCentre(document: NetworkDocument, f0: number, span = 0.6, points = 1201): number | undefined {
  const conditions = (document.spec?.conditions ?? []) as unknown as SpecCondition[]
  if (!conditions.length) return undefined
  const solved = solveDocument({ ...document, sweep: { start: f0 * (1 - span), stop: f0 * (1 + span), points, spacing: 'linear' } })
  if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('; '))
  const band = findBandwidth(solved.result, { center: f0, conditions })
  return band.ok ? 0.5 * (band.low + band.high) : undefined
}
