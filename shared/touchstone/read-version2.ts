import { dataRow, gatherFrequency, type DataRow, type FrequencyBlock } from './data-rows'
import { TouchstoneError } from './error'
import { keywordCount, parseKeyword, type Keyword, type KeywordLine } from './keywords'
import { TOUCHSTONE_LIMITS } from './limits'
import { clip, numberAt, words, type SourceLine } from './lines'
import { matrixCells } from './matrix-cells'
import { decodeNetwork } from './network-data'
import { readNoiseRows } from './noise-data'
import { parseOptionLine } from './option-line'
import { FREQUENCY_UNITS, type MatrixFormat, type OptionLine, type TouchstoneFile, type TwoPortOrder } from './types'

/** What the keywords before [Network Data] say. */
interface Header {
  version: '2.0' | '2.1'
  options?: OptionLine
  optionLine?: number
  ports?: number
  twoPortOrder?: TwoPortOrder
  frequencies?: number
  noiseFrequencies?: number
  reference?: number[]
  matrixFormat: MatrixFormat
  seen: Map<Keyword, number>
}

/**
 * Reads a version 2.0/2.1 file: [Version] first, then the option line and keywords, then
 * [Network Data], optionally [Noise Data], and [End] last. Counts given by keywords must match the data.
 */
export function readVersion2(lines: readonly SourceLine[], knownPorts: number | undefined): TouchstoneFile {
  const version = readVersionLine(lines[0]!)
  const header: Header = { version, matrixFormat: 'Full', seen: new Map([['Version', lines[0]!.line]]) }
  let network: { blocks: FrequencyBlock[]; line: number } | undefined
  let noise: { rows: DataRow[]; line: number } | undefined
  let ended = false
  let at = 1
  while (at < lines.length) {
    const source = lines[at]!
    if (ended) throw new TouchstoneError(source.line, 'nothing may follow [End]')
    if (source.text.startsWith('#')) {
      if (header.options) throw new TouchstoneError(source.line, `a second option line (the first is on line ${header.optionLine}); a file has one`)
      if (network) throw new TouchstoneError(source.line, 'the option line must come before [Network Data]')
      header.options = parseOptionLine(source.text, source.line)
      header.optionLine = source.line
      at++
      continue
    }
    if (!source.text.startsWith('[')) throw new TouchstoneError(source.line, 'numbers outside [Network Data], [Noise Data] or [Reference]')
    const entry = parseKeyword(source.text, source.line)
    const earlier = header.seen.get(entry.keyword)
    if (earlier !== undefined) throw new TouchstoneError(entry.line, `[${entry.keyword}] appears twice (first on line ${earlier})`)
    header.seen.set(entry.keyword, entry.line)
    at++
    switch (entry.keyword) {
      case 'Network Data': {
        requireBeforeData(header, entry, knownPorts)
        const rows = takeRows(lines, at)
        at += rows.length
        network = { blocks: gatherNetwork(rows, header, entry), line: entry.line }
        break
      }
      case 'Noise Data': {
        if (!network) throw new TouchstoneError(entry.line, '[Noise Data] must come after [Network Data]')
        if (header.ports !== 2) throw new TouchstoneError(entry.line, `noise data belongs to two-ports only; this file has ${header.ports} ports`)
        if (header.noiseFrequencies === undefined) throw new TouchstoneError(entry.line, '[Noise Data] needs [Number of Noise Frequencies] before [Network Data]')
        const rows = takeRows(lines, at)
        at += rows.length
        if (rows.length !== header.noiseFrequencies) {
          throw new TouchstoneError(rows[rows.length - 1]?.line ?? entry.line, `[Number of Noise Frequencies] says ${header.noiseFrequencies} but [Noise Data] has ${rows.length} line${rows.length === 1 ? '' : 's'}`)
        }
        noise = { rows, line: entry.line }
        break
      }
      case 'End':
        if (entry.rest) throw new TouchstoneError(entry.line, '[End] takes no value')
        ended = true
        break
      case 'Begin Information':
        at = skipInformation(lines, at, entry)
        break
      default:
        if (network) throw new TouchstoneError(entry.line, `[${entry.keyword}] must come before [Network Data]`)
        at = readHeaderKeyword(header, entry, lines, at)
    }
  }
  const last = lines[lines.length - 1]!.line
  if (!network) throw new TouchstoneError(last, 'the file has no [Network Data]')
  if (!ended) throw new TouchstoneError(last, 'a version 2 file must end with [End]')
  if (header.noiseFrequencies !== undefined && !noise) throw new TouchstoneError(last, '[Number of Noise Frequencies] is given but the file has no [Noise Data]')
  const ports = header.ports!
  const options = header.options!
  const refs = header.reference ?? Array<number>(ports).fill(options.resistance)
  const decoded = decodeNetwork(network.blocks, {
    ports, options, cells: matrixCells(ports, header.matrixFormat, header.twoPortOrder ?? '12_21'), matrixFormat: header.matrixFormat, refs, normalised: false,
  })
  return {
    version,
    options,
    ports,
    impedances: refs,
    ...decoded,
    noise: noise ? readNoiseRows(noise.rows, FREQUENCY_UNITS[options.unit], 1) : [],
    matrixFormat: header.matrixFormat,
  }
}

function readVersionLine(first: SourceLine): '2.0' | '2.1' {
  const entry = parseKeyword(first.text, first.line)
  if (entry.keyword !== 'Version') throw new TouchstoneError(first.line, `a version 2 file starts with [Version], not [${entry.keyword}]`)
  if (entry.rest === '2.0' || entry.rest === '2.1') return entry.rest
  throw new TouchstoneError(first.line, `[Version] must be 2.0 or 2.1 (got "${clip(entry.rest)}"); version 1 files have no [Version] line`)
}

/** The data lines from `at` up to the next keyword or option line. */
function takeRows(lines: readonly SourceLine[], at: number): DataRow[] {
  const rows: DataRow[] = []
  for (let i = at; i < lines.length && !lines[i]!.text.startsWith('[') && !lines[i]!.text.startsWith('#'); i++) rows.push(dataRow(lines[i]!))
  return rows
}

function requireBeforeData(header: Header, entry: KeywordLine, knownPorts: number | undefined): void {
  if (!header.options) throw new TouchstoneError(entry.line, 'the option line (# …) must come before [Network Data]')
  if (header.ports === undefined) throw new TouchstoneError(entry.line, '[Number of Ports] must come before [Network Data]')
  if (header.frequencies === undefined) throw new TouchstoneError(entry.line, '[Number of Frequencies] must come before [Network Data]')
  if (header.ports === 2 && !header.twoPortOrder) throw new TouchstoneError(entry.line, 'a two-port file needs [Two-Port Data Order] (12_21 or 21_12) before [Network Data]')
  const kind = header.options.parameter
  if ((kind === 'H' || kind === 'G') && header.ports !== 2) throw new TouchstoneError(header.optionLine!, `${kind}-parameters describe two-ports only; this file has ${header.ports} ports`)
  if (knownPorts !== undefined && knownPorts !== header.ports) {
    throw new TouchstoneError(header.seen.get('Number of Ports')!, `[Number of Ports] says ${header.ports} but the file name says ${knownPorts}`)
  }
}

function gatherNetwork(rows: readonly DataRow[], header: Header, entry: KeywordLine): FrequencyBlock[] {
  const ports = header.ports!
  const cells = header.matrixFormat === 'Full' ? ports * ports : (ports * (ports + 1)) / 2
  const count = 1 + 2 * cells
  const blocks: FrequencyBlock[] = []
  let at = 0
  while (at < rows.length) {
    if (blocks.length === header.frequencies) {
      throw new TouchstoneError(rows[at]!.line, `[Number of Frequencies] says ${header.frequencies} but [Network Data] has more`)
    }
    const { block, next } = gatherFrequency(rows, at, count, ports)
    blocks.push(block)
    at = next
  }
  if (blocks.length !== header.frequencies) {
    throw new TouchstoneError(rows[rows.length - 1]?.line ?? entry.line, `[Number of Frequencies] says ${header.frequencies} but [Network Data] has ${blocks.length}`)
  }
  return blocks
}

/** Reads one header keyword; [Reference] may continue on the lines after it. Returns the next line index. */
function readHeaderKeyword(header: Header, entry: KeywordLine, lines: readonly SourceLine[], at: number): number {
  switch (entry.keyword) {
    case 'Number of Ports':
      header.ports = keywordCount(entry, 1, TOUCHSTONE_LIMITS.ports)
      return at
    case 'Two-Port Data Order': {
      if (header.ports === undefined) throw new TouchstoneError(entry.line, '[Number of Ports] must come before [Two-Port Data Order]')
      if (header.ports !== 2) throw new TouchstoneError(entry.line, `[Two-Port Data Order] belongs to two-port files; this one has ${header.ports} ports`)
      const order = entry.rest
      if (order !== '12_21' && order !== '21_12') throw new TouchstoneError(entry.line, `[Two-Port Data Order] must be 12_21 or 21_12 (got "${clip(order)}")`)
      header.twoPortOrder = order
      return at
    }
    case 'Number of Frequencies':
      header.frequencies = keywordCount(entry, 1, TOUCHSTONE_LIMITS.frequencies)
      return at
    case 'Number of Noise Frequencies':
      header.noiseFrequencies = keywordCount(entry, 1, TOUCHSTONE_LIMITS.noiseFrequencies)
      return at
    case 'Matrix Format': {
      const format = entry.rest.toLowerCase()
      if (format !== 'full' && format !== 'lower' && format !== 'upper') throw new TouchstoneError(entry.line, `[Matrix Format] must be Full, Lower or Upper (got "${clip(entry.rest)}")`)
      header.matrixFormat = format === 'full' ? 'Full' : format === 'lower' ? 'Lower' : 'Upper'
      return at
    }
    case 'Reference':
      return readReference(header, entry, lines, at)
    case 'Mixed-Mode Order':
      throw new TouchstoneError(entry.line, 'mixed-mode data cannot be read here; export single-ended data instead')
    case 'End Information':
      throw new TouchstoneError(entry.line, '[End Information] without [Begin Information]')
    default:
      throw new TouchstoneError(entry.line, `[${entry.keyword}] is out of place here`)
  }
}

/** [Reference]: one real, positive impedance per port, on its own line and as many lines after it as needed. */
function readReference(header: Header, entry: KeywordLine, lines: readonly SourceLine[], at: number): number {
  if (header.ports === undefined) throw new TouchstoneError(entry.line, '[Number of Ports] must come before [Reference]')
  const ports = header.ports
  const values: number[] = []
  const add = (text: string, line: number): void => {
    for (const word of words(text)) {
      if (values.length === ports) throw new TouchstoneError(line, `[Reference] has more than ${ports} values (one per port)`)
      const value = numberAt(word, line, 'a reference impedance in ohms')
      if (!(value > 0)) throw new TouchstoneError(line, `a reference impedance must be greater than zero (got ${word})`)
      values.push(value)
    }
  }
  add(entry.rest, entry.line)
  let index = at
  while (values.length < ports) {
    const source = lines[index]
    if (!source || source.text.startsWith('[') || source.text.startsWith('#')) {
      throw new TouchstoneError(source?.line ?? entry.line, `[Reference] has ${values.length} value${values.length === 1 ? '' : 's'} but the file has ${ports} ports`)
    }
    add(source.text, source.line)
    index++
  }
  header.reference = values
  return index
}

/** Skips a [Begin Information] … [End Information] section, which holds nothing the reader uses. */
function skipInformation(lines: readonly SourceLine[], at: number, entry: KeywordLine): number {
  for (let i = at; i < lines.length; i++) {
    if (/^\[[ \t]*end[ \t]+information[ \t]*\]/i.test(lines[i]!.text)) return i + 1
  }
  throw new TouchstoneError(entry.line, '[Begin Information] has no [End Information]')
}
