import type { Problem } from '../network/types'

/** An evaluated frequency sweep in hertz. */
export interface SweepSettings {
  start: number
  stop: number
  points: number
  spacing: 'linear' | 'log'
}

/** Largest sweep accepted, to keep results within memory. */
export const MAX_POINTS = 1_000_000

/** Combines the document's sweep with an override and checks it; problems name the field. */
export function resolveSweep(
  sweep: Partial<SweepSettings> | undefined,
  override: Partial<SweepSettings> = {},
): { ok: true; sweep: SweepSettings } | { ok: false; problems: Problem[] } {
  const start = override.start ?? sweep?.start
  const stop = override.stop ?? sweep?.stop
  const points = override.points ?? sweep?.points ?? 201
  const spacing = override.spacing ?? sweep?.spacing ?? 'linear'
  const problems: Problem[] = []
  if (start === undefined) problems.push({ field: 'sweep.start', message: 'sweep.start is missing: give the sweep in the document or override it' })
  if (stop === undefined) problems.push({ field: 'sweep.stop', message: 'sweep.stop is missing: give the sweep in the document or override it' })
  if (!Number.isInteger(points) || points < 1 || points > MAX_POINTS) {
    problems.push({ field: 'sweep.points', message: `sweep.points must be a whole number from 1 to ${MAX_POINTS} (got ${points})` })
  }
  if (spacing !== 'linear' && spacing !== 'log') problems.push({ field: 'sweep.spacing', message: `sweep.spacing must be linear or log (got ${String(spacing)})` })
  if (start !== undefined && !(start >= 0 && Number.isFinite(start))) problems.push({ field: 'sweep.start', message: `sweep.start must be a frequency of 0 Hz or more (got ${start})` })
  if (start !== undefined && stop !== undefined && points > 1 && !(stop >= start && Number.isFinite(stop))) {
    problems.push({ field: 'sweep.stop', message: `sweep.stop (${stop} Hz) must not be below sweep.start (${start} Hz)` })
  }
  if (spacing === 'log' && start !== undefined && !(start > 0)) problems.push({ field: 'sweep.start', message: 'sweep.start must be above 0 Hz for log spacing' })
  if (problems.length) return { ok: false, problems }
  return { ok: true, sweep: { start: start!, stop: stop!, points, spacing } }
}

/**
 * Frequencies of a sweep (Hz), linear or log spaced; with one point, `start`.
 * Throws a RangeError for an invalid sweep: check user input with `resolveSweep` first.
 */
export function sweepFrequencies(sweep: Partial<SweepSettings> | undefined, override?: Partial<SweepSettings>): Float64Array {
  const resolved = resolveSweep(sweep, override)
  if (!resolved.ok) throw new RangeError(resolved.problems.map(p => p.message).join('; '))
  const { start, stop, points, spacing } = resolved.sweep
  const out = new Float64Array(points)
  if (points === 1) {
    out[0] = start
    return out
  }
  const last = points - 1
  if (spacing === 'linear') {
    for (let k = 0; k < points; k++) out[k] = start + ((stop - start) * k) / last
  } else {
    const ratio = Math.log(stop / start)
    for (let k = 0; k < points; k++) out[k] = start * Math.exp((ratio * k) / last)
  }
  // Land exactly on the end point rather than a rounding of it.
  out[last] = stop
  return out
}
