/**
 * Splits trials [0, trials) into at most `parts` contiguous index ranges of near-equal size, none empty.
 * Draws depend only on (seed, trial index, key), so any split gives the same designs and counts.
 */
export function splitTrials(trials: number, parts: number): Array<{ from: number, to: number }> {
  const count = Math.max(1, Math.min(Math.floor(parts), trials))
  const ranges: Array<{ from: number, to: number }> = []
  for (let i = 0; i < count && trials > 0; i++) {
    ranges.push({ from: Math.floor((i * trials) / count), to: Math.floor(((i + 1) * trials) / count) })
  }
  return ranges
}
