/** A Touchstone file that breaks the specification or our limits: `line` (from 1) and a reason in plain words. */
export class TouchstoneError extends Error {
  readonly line: number
  readonly reason: string

  constructor(line: number, reason: string) {
    super(`line ${line}: ${reason}`)
    this.name = 'TouchstoneError'
    this.line = line
    this.reason = reason
  }
}
