import { TouchstoneError } from './error'
import { clip } from './lines'

/** Keywords of version 2 files (case-insensitive in the file). */
export const KEYWORDS = [
  'Version', 'Number of Ports', 'Two-Port Data Order', 'Number of Frequencies', 'Number of Noise Frequencies',
  'Reference', 'Matrix Format', 'Mixed-Mode Order', 'Begin Information', 'End Information',
  'Network Data', 'Noise Data', 'End',
] as const
export type Keyword = typeof KEYWORDS[number]

const BY_UPPER = new Map<string, Keyword>(KEYWORDS.map(k => [k.toUpperCase(), k]))

/** A keyword line split into its keyword and the rest of the line. */
export interface KeywordLine {
  keyword: Keyword
  rest: string
  line: number
}

/** Reads `[Keyword] rest`; an unknown keyword or a missing `]` is an error naming it. */
export function parseKeyword(text: string, line: number): KeywordLine {
  const close = text.indexOf(']')
  if (close === -1) throw new TouchstoneError(line, `"${clip(text)}" opens a keyword with [ but has no closing ]`)
  const name = text.slice(1, close).trim().replace(/[ \t]+/g, ' ').toUpperCase()
  const keyword = BY_UPPER.get(name)
  if (!keyword) throw new TouchstoneError(line, `[${clip(text.slice(1, close))}] is not a Touchstone keyword`)
  return { keyword, rest: text.slice(close + 1).trim(), line }
}

/** A whole number in [min, max] after a keyword, or an error naming the keyword. */
export function keywordCount(entry: KeywordLine, min: number, max: number): number {
  const value = entry.rest
  if (!/^\d+$/.test(value)) throw new TouchstoneError(entry.line, `[${entry.keyword}] must be followed by a whole number (got "${clip(value)}")`)
  const count = Number(value)
  if (count < min) throw new TouchstoneError(entry.line, `[${entry.keyword}] must be at least ${min} (got ${count})`)
  if (count > max) throw new TouchstoneError(entry.line, `[${entry.keyword}] is ${count}; at most ${max.toLocaleString('en-GB')} can be read`)
  return count
}
