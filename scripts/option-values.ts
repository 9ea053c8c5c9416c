/**
 * Reading numeric command-line options for the tuning, tolerance and beam commands. Each reader records a
 * problem naming the option instead of failing at once, so a command can report every bad option together.
 */

/** A whole number within [min, max], or `fallback` when the option is absent. */
export function wholeNumberOption(problems: string[], option: string, text: string | undefined, range: { min: number; max: number }, fallback?: number): number | undefined {
  if (text === undefined) {
    if (fallback === undefined) problems.push(`--${option}: is required`)
    return fallback
  }
  const value = Number(text)
  if (text.trim() === '' || !Number.isInteger(value) || value < range.min || value > range.max) {
    problems.push(`--${option}: must be a whole number from ${range.min} to ${range.max.toLocaleString('en-GB')} (got "${text}")`)
    return undefined
  }
  return value
}

/** A comma-separated list of port numbers (1, 2, …) without repeats. */
export function portListOption(problems: string[], option: string, text: string | undefined): number[] | undefined {
  if (text === undefined) {
    problems.push(`--${option}: is required (ports separated by commas, e.g. 1,2,3,4)`)
    return undefined
  }
  const parts = text.split(',').map(p => p.trim())
  const ports = parts.map(Number)
  const bad = parts.find((p, i) => p === '' || !Number.isInteger(ports[i]) || ports[i]! < 1)
  if (bad !== undefined) {
    problems.push(`--${option}: "${bad}" is not a port number (give ports separated by commas, e.g. 1,2,3,4)`)
    return undefined
  }
  const repeated = ports.find((p, i) => ports.indexOf(p) !== i)
  if (repeated !== undefined) {
    problems.push(`--${option}: port ${repeated} is given twice`)
    return undefined
  }
  return ports
}

/** A positive finite number (a plain number, no unit). */
export function positiveNumberOption(problems: string[], option: string, text: string | undefined, max: number): number | undefined {
  if (text === undefined) {
    problems.push(`--${option}: is required`)
    return undefined
  }
  const value = Number(text)
  if (text.trim() === '' || !Number.isFinite(value) || !(value > 0) || value > max) {
    problems.push(`--${option}: must be a number above 0 and at most ${max} (got "${text}")`)
    return undefined
  }
  return value
}
