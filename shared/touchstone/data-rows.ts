import { formatQuantity } from '../network/format-quantity'
import { TouchstoneError } from './error'
import { numbersOf, type SourceLine } from './lines'

/** A line of numbers. */
export interface DataRow {
  line: number
  values: number[]
}

/** Reads a line of whitespace-separated numbers; any other word is an error naming it. */
export function dataRow(source: SourceLine): DataRow {
  return { line: source.line, values: numbersOf(source.text, source.line) }
}

/** One frequency's numbers gathered from one or more lines; `line` is where it starts. */
export interface FrequencyBlock {
  line: number
  values: number[]
}

/**
 * Gathers the numbers of one frequency, `count` values starting at the beginning of rows[at]
 * (a frequency always starts a new line) and ending exactly at the end of a line.
 * Returns the block and the index of the next row.
 */
export function gatherFrequency(rows: readonly DataRow[], at: number, count: number, ports: number): { block: FrequencyBlock; next: number } {
  const first = rows[at]!
  const values: number[] = []
  let index = at
  while (values.length < count) {
    const row = rows[index]
    if (!row) {
      const last = rows[index - 1]!
      throw new TouchstoneError(last.line, `the data ends inside the frequency that starts on line ${first.line}: it has ${values.length} of the ${count} numbers a ${ports}-port frequency needs`)
    }
    if (values.length + row.values.length > count) {
      throw new TouchstoneError(row.line, `this line has ${row.values.length} numbers but the frequency that starts on line ${first.line} needs only ${count - values.length} more (${count} in all for ${ports} port${ports === 1 ? '' : 's'})`)
    }
    for (const v of row.values) values.push(v)
    index++
  }
  return { block: { line: first.line, values }, next: index }
}

/** Converts a frequency to Hz and checks it is finite, not negative and above the previous one. */
export function checkedFrequency(value: number, multiplier: number, previous: number | undefined, line: number): number {
  const hz = value * multiplier
  if (!Number.isFinite(hz)) throw new TouchstoneError(line, `the frequency ${value} is too large`)
  if (hz < 0) throw new TouchstoneError(line, `the frequency ${value} is negative`)
  if (previous !== undefined && !(hz > previous)) {
    throw new TouchstoneError(line, `the frequency ${formatQuantity(hz, 'frequency')} is not above the one before it (${formatQuantity(previous, 'frequency')}); frequencies must increase`)
  }
  return hz
}
