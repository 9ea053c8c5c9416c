import { TouchstoneError } from './error'
import { TOUCHSTONE_LIMITS } from './limits'

/** One line of a Touchstone file with its comment removed: `line` counts from 1. */
export interface SourceLine {
  line: number
  text: string
}

/**
 * Splits a Touchstone file into its meaningful lines: everything after `!` is a comment
 * (anywhere on a line), blank lines are dropped, CR, LF and CRLF all end a line.
 */
export function sourceLines(text: string): SourceLine[] {
  if (text.length > TOUCHSTONE_LIMITS.characters) {
    throw new TouchstoneError(1, `the file is larger than ${TOUCHSTONE_LIMITS.characters / 1024 / 1024} MiB`)
  }
  const lines: SourceLine[] = []
  const raw = text.split(/\r\n|\n|\r/)
  for (let i = 0; i < raw.length; i++) {
    const whole = raw[i]!
    if (whole.length > TOUCHSTONE_LIMITS.lineCharacters) {
      throw new TouchstoneError(i + 1, `the line is longer than ${TOUCHSTONE_LIMITS.lineCharacters.toLocaleString('en-GB')} characters`)
    }
    const bang = whole.indexOf('!')
    const content = (bang === -1 ? whole : whole.slice(0, bang)).trim()
    if (!content) continue
    // The specification allows printable ASCII, tabs and line ends only (comments are not ours to judge).
    const bad = /[^\t\x20-\x7e]/.exec(content)
    if (bad) {
      const code = bad[0].codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')
      throw new TouchstoneError(i + 1, `unexpected character U+${code} (only plain ASCII text is allowed outside comments)`)
    }
    lines.push({ line: i + 1, text: content })
  }
  return lines
}

/** Whitespace-separated words of a line. */
export function words(text: string): string[] {
  return text.split(/[ \t]+/).filter(w => w !== '')
}

// A decimal number as the specification writes them: no hex, no Infinity, no NaN, no stray characters.
const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/

/** Reads one numeric word, or fails naming it; the result is always finite. */
export function numberAt(word: string, line: number, what = 'a number'): number {
  if (!NUMBER.test(word)) throw new TouchstoneError(line, `"${clip(word)}" is not ${what}`)
  const value = Number(word)
  if (!Number.isFinite(value)) throw new TouchstoneError(line, `"${clip(word)}" is too large to be ${what}`)
  return value
}

/** Whether a word reads as a number (data lines are lines whose first word does). */
export function isNumberWord(word: string): boolean {
  return NUMBER.test(word)
}

/** Shortens a word quoted back in a message so that a hostile file cannot flood the error. */
export function clip(word: string): string {
  return word.length > 24 ? `${word.slice(0, 24)}…` : word
}

/**
 * Reads a line of whitespace-separated decimal numbers in one pass (the hot loop of a large file):
 * words of digits, signs, points and exponents only, each reading as a finite number.
 */
export function numbersOf(text: string, line: number): number[] {
  const values: number[] = []
  const length = text.length
  let at = 0
  while (at < length) {
    let code = text.charCodeAt(at)
    if (code === 32 || code === 9) { at++; continue }
    const start = at
    let plain = true
    while (at < length) {
      code = text.charCodeAt(at)
      if (code === 32 || code === 9) break
      // 0-9 + - . e E
      if (!((code >= 48 && code <= 57) || code === 43 || code === 45 || code === 46 || code === 101 || code === 69)) plain = false
      at++
    }
    const word = text.slice(start, at)
    const value = plain ? Number(word) : Number.NaN
    if (!Number.isFinite(value)) values.push(numberAt(word, line))
    else values.push(value)
  }
  return values
}
