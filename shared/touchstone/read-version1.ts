import { dataRow, gatherFrequency, type DataRow, type FrequencyBlock } from './data-rows'
import { TouchstoneError } from './error'
import { TOUCHSTONE_LIMITS } from './limits'
import type { SourceLine } from './lines'
import { matrixCells } from './matrix-cells'
import { decodeNetwork } from './network-data'
import { readNoiseRows } from './noise-data'
import { DEFAULT_OPTIONS, parseOptionLine } from './option-line'
import { FREQUENCY_UNITS, type OptionLine, type TouchstoneFile } from './types'

/**
 * Reads a version 1.0/1.1 file: one optional option line before the data, then one frequency
 * per group of lines (each frequency starts a new line), then, for two-ports, noise rows from
 * the first frequency that does not rise. `ports` comes from the file name when known,
 * otherwise from the first frequency's numbers.
 */
export function readVersion1(lines: readonly SourceLine[], knownPorts: number | undefined): TouchstoneFile {
  let options: OptionLine = { ...DEFAULT_OPTIONS }
  let optionLine: number | undefined
  const rows: DataRow[] = []
  for (const source of lines) {
    if (source.text.startsWith('#')) {
      if (optionLine !== undefined) throw new TouchstoneError(source.line, `a second option line (the first is on line ${optionLine}); a file has one`)
      if (rows.length) throw new TouchstoneError(source.line, 'the option line must come before the data')
      options = parseOptionLine(source.text, source.line)
      optionLine = source.line
    } else if (source.text.startsWith('[')) {
      throw new TouchstoneError(source.line, 'keywords in [ ] belong to version 2 files, which start with [Version] 2.0 (or 2.1)')
    } else {
      rows.push(dataRow(source))
    }
  }
  if (!rows.length) throw new TouchstoneError(lines[lines.length - 1]?.line ?? 1, 'the file has no network data')
  const ports = knownPorts ?? portsFromFirstFrequency(rows)
  if (ports > TOUCHSTONE_LIMITS.ports) throw new TouchstoneError(rows[0]!.line, `the data has ${ports} ports; at most ${TOUCHSTONE_LIMITS.ports} can be read`)
  if ((options.parameter === 'H' || options.parameter === 'G') && ports !== 2) {
    throw new TouchstoneError(optionLine ?? rows[0]!.line, `${options.parameter}-parameters describe two-ports only; this file has ${ports} port${ports === 1 ? '' : 's'}`)
  }
  const count = 1 + 2 * ports * ports
  const multiplier = FREQUENCY_UNITS[options.unit]
  const blocks: FrequencyBlock[] = []
  let at = 0
  let previous = -Infinity
  while (at < rows.length) {
    const first = rows[at]!
    const hz = first.values[0]! * multiplier
    // Two-port noise data follows the network data; its first frequency does not rise.
    // A falling line of a whole network row is out of order instead, and is reported so.
    if (blocks.length && ports === 2 && hz <= previous && first.values.length !== count) break
    if (blocks.length >= TOUCHSTONE_LIMITS.frequencies) throw new TouchstoneError(first.line, `more than ${TOUCHSTONE_LIMITS.frequencies.toLocaleString('en-GB')} frequencies`)
    const { block, next } = gatherFrequency(rows, at, count, ports)
    blocks.push(block)
    previous = hz
    at = next
  }
  const noiseRows = rows.slice(at)
  if (noiseRows.length > TOUCHSTONE_LIMITS.noiseFrequencies) throw new TouchstoneError(noiseRows[0]!.line, `more than ${TOUCHSTONE_LIMITS.noiseFrequencies.toLocaleString('en-GB')} noise frequencies`)
  const refs = Array<number>(ports).fill(options.resistance)
  const network = decodeNetwork(blocks, { ports, options, cells: matrixCells(ports, 'Full', '21_12'), matrixFormat: 'Full', refs, normalised: true })
  return {
    version: '1',
    options,
    ports,
    impedances: refs,
    ...network,
    noise: readNoiseRows(noiseRows, multiplier, options.resistance),
    matrixFormat: 'Full',
  }
}

/**
 * The number of ports of a version 1 file without a file name: the first frequency is its first
 * line (an odd count: frequency and pairs) and the lines of pairs that follow it (even counts).
 */
function portsFromFirstFrequency(rows: readonly DataRow[]): number {
  const first = rows[0]!
  if (first.values.length % 2 === 0) {
    throw new TouchstoneError(first.line, `the first data line has ${first.values.length} numbers; a frequency line has the frequency and then pairs, an odd count`)
  }
  let total = first.values.length
  for (let i = 1; i < rows.length && rows[i]!.values.length % 2 === 0; i++) total += rows[i]!.values.length
  const ports = Math.round(Math.sqrt((total - 1) / 2))
  if (ports < 1 || 1 + 2 * ports * ports !== total) {
    throw new TouchstoneError(first.line, `the first frequency has ${total} numbers, which fits no number of ports (N ports take 1 + 2·N² numbers: 3, 9, 19, 33, …)`)
  }
  return ports
}
