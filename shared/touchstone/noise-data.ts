import { checkedFrequency, type DataRow } from './data-rows'
import { TouchstoneError } from './error'
import type { NoisePoint } from './types'

/**
 * Reads two-port noise rows: frequency, minimum noise figure (dB), |Γopt|, angle of Γopt (degrees),
 * effective noise resistance — divided by R in version 1 files (`rnScale` = R), in ohms in version 2 (`rnScale` = 1).
 */
export function readNoiseRows(rows: readonly DataRow[], multiplier: number, rnScale: number): NoisePoint[] {
  const noise: NoisePoint[] = []
  let previous: number | undefined
  for (const row of rows) {
    if (row.values.length !== 5) {
      throw new TouchstoneError(row.line, `a noise data line has 5 numbers (frequency, minimum noise figure, |Γopt|, angle of Γopt, noise resistance); this one has ${row.values.length}`)
    }
    const [f, nfMinDb, magnitude, degrees, rn] = row.values as [number, number, number, number, number]
    const frequency = checkedFrequency(f, multiplier, previous, row.line)
    previous = frequency
    if (magnitude < 0) throw new TouchstoneError(row.line, `the magnitude of Γopt must not be negative (got ${magnitude})`)
    if (rn < 0) throw new TouchstoneError(row.line, `the effective noise resistance must not be negative (got ${rn})`)
    const rnOhms = rn * rnScale
    if (!Number.isFinite(rnOhms)) throw new TouchstoneError(row.line, `the effective noise resistance ${rn} is too large`)
    noise.push({ frequency, nfMinDb, gammaOptMagnitude: magnitude, gammaOptDegrees: degrees, rnOhms })
  }
  return noise
}
