import type { NetworkDocument } from '../network/types'
import { evaluateQuantity } from '../network/expression'
import { evaluateVariables } from '../network/variables'
import { solveDocument, type PrepareOptions } from '../solver'
import { findBandwidth, type BandwidthResult } from '../rf/find-bandwidth'
import { magnitudeDb } from '../rf/magnitude-db'
import { phaseDeg } from '../rf/phase-deg'
import { sParameter } from '../rf/s-parameter'
import type { SParameterSet } from '../rf/types'
import { resolveSpec } from '../network/spec'

/** A transmission from port 1 at the centre frequency; `db` is null where it is exactly zero. */
export interface TransferFigure {
  to: number
  from: number
  db: number | null
  phaseDeg: number
}

/**
 * What a snapshot shows at a glance, computed once when it is frozen: key figures at the
 * centre frequency and the band that meets the document's spec mask, if it has one.
 */
export interface SnapshotSummary {
  solved: boolean
  /** Why it could not be solved (first problem), when `solved` is false. */
  problem?: string
  /** Centre frequency (Hz) and where it came from: the spec mask, the variable f0, or the sweep's middle. */
  centre?: { frequency: number; from: 'spec' | 'f0' | 'sweep' }
  ports?: number
  /** −20·log10|S_pp| per port; null where there is no reflection at all. */
  returnLoss?: Array<{ port: number; db: number | null }>
  /** S(p,1) for every other port p. */
  transfer?: TransferFigure[]
  /** Between the two strongest outputs from port 1 (3 ports or more). */
  balance?: { from: number; a: number; b: number; imbalanceDb: number; phaseDifferenceDeg: number }
  /** Band meeting the spec mask; null when the document has none. */
  bandwidth?: BandwidthResult | null
}

export interface SnapshotSummaryOptions extends PrepareOptions {
  /**
   * Most points solved for the bandwidth; a longer sweep is resampled to this many.
   * @default 2001
   */
  maxPoints?: number
}

/** Reflections below this are reported as "none" rather than as an enormous number of dB. */
const NO_REFLECTION_DB = -300

function centreOf(document: NetworkDocument, specCentre: number | undefined, sweep: { start: number; stop: number }) {
  if (specCentre !== undefined) return { frequency: specCentre, from: 'spec' as const }
  const vars = evaluateVariables(document.variables)
  if (vars.scope.has('f0') && !vars.failed.has('f0')) {
    const f0 = evaluateQuantity('f0', 'frequency', vars.scope)
    if (f0.ok && f0.value > 0) return { frequency: f0.value, from: 'f0' as const }
  }
  return { frequency: (sweep.start + sweep.stop) / 2, from: 'sweep' as const }
}

function db(data: SParameterSet, to: number, from: number): number | null {
  const value = magnitudeDb(sParameter(data, to, from))[0]!
  return value > NO_REFLECTION_DB ? value : null
}

function keyFigures(at: SParameterSet): Pick<SnapshotSummary, 'returnLoss' | 'transfer' | 'balance'> {
  const n = at.ports
  const ports = Array.from({ length: n }, (_, k) => k + 1)
  const returnLoss = ports.map((port) => {
    const d = db(at, port, port)
    return { port, db: d === null ? null : -d }
  })
  const transfer = ports.filter(p => p !== 1).map(to => ({ to, from: 1, db: db(at, to, 1), phaseDeg: phaseDeg(sParameter(at, to, 1))[0]! }))
  if (transfer.length < 2) return { returnLoss, transfer }
  const strongest = [...transfer].sort((x, y) => (y.db ?? -Infinity) - (x.db ?? -Infinity)).slice(0, 2).sort((x, y) => x.to - y.to)
  const [a, b] = strongest as [TransferFigure, TransferFigure]
  let difference = a.phaseDeg - b.phaseDeg
  difference = ((((difference + 180) % 360) + 360) % 360) - 180
  if (difference === -180) difference = 180
  const balance = a.db !== null && b.db !== null
    ? { from: 1, a: a.to, b: b.to, imbalanceDb: Math.abs(a.db - b.db), phaseDifferenceDeg: difference }
    : undefined
  return { returnLoss, transfer, ...(balance ? { balance } : {}) }
}

/**
 * Solves a document and summarises it for a snapshot. Never throws for a bad document:
 * the summary then says `solved: false` with the first problem, so a snapshot of work in
 * progress can still be frozen. Pure: no I/O beyond the subnetwork resolver it is given.
 */
export function snapshotSummary(document: NetworkDocument, options: SnapshotSummaryOptions = {}): SnapshotSummary {
  const maxPoints = options.maxPoints ?? 2001
  const spec = resolveSpec(document)
  const points = Math.min(typeof document.sweep?.points === 'number' ? document.sweep.points : 201, maxPoints)
  const swept = solveDocument(document, { ...options, sweep: { points } })
  if (!swept.ok) return { solved: false, problem: swept.problems[0]?.message ?? 'the network cannot be solved' }
  const f = swept.result.frequencies
  const centre = centreOf(document, spec?.ok ? spec.spec.center : undefined, { start: f[0]!, stop: f[f.length - 1]! })
  const atCentre = solveDocument(document, { ...options, sweep: { start: centre.frequency, stop: centre.frequency, points: 1 } })
  if (!atCentre.ok) return { solved: false, centre, problem: atCentre.problems[0]?.message ?? 'the network cannot be solved at the centre' }
  let bandwidth: BandwidthResult | null = null
  if (spec && !spec.ok) bandwidth = { ok: false, reason: `the spec cannot be read (${spec.problems[0]?.message ?? 'unknown problem'})` }
  else if (spec?.ok) bandwidth = findBandwidth(swept.result, spec.spec)
  return { solved: true, centre, ports: atCentre.result.ports, ...keyFigures(atCentre.result), bandwidth }
}
