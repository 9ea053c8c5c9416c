import { SAFETY_NOTE } from '../solver/safety-note'
import { FREQUENCY_UNITS, type FrequencyUnit, type NoisePoint, type NumberFormat } from './types'

/** S-parameters in the solver's layout: S(i+1)(j+1) at frequency k at index (k·ports + i)·ports + j. */
export interface TouchstoneData {
  ports: number
  impedances: readonly number[]
  frequencies: Float64Array | number[]
  re: Float64Array | number[]
  im: Float64Array | number[]
  /** Two-port noise data to write back after the network data. */
  noise?: NoisePoint[]
}

/** Options of `writeTouchstone`. */
export interface TouchstoneOptions {
  /** Comment lines written after `!` at the top. */
  comments?: string[]
  /** Adds the simulated-results caution as a comment line after `comments`. @default false */
  caution?: boolean
  /**
   * '1.1' (one R for every port; throws when the ports differ), '2.0' (with [Matrix Format] Full),
   * or unset: 1.1 when it can carry the data, 2.0 otherwise.
   */
  version?: '1.1' | '2.0'
  /** @default 'RI' */
  format?: NumberFormat
  /** @default 'HZ' */
  unit?: FrequencyUnit
  /** Ports to write (numbered from 1, in the order given); the data's other ports are left out. @default all */
  ports?: number[]
}

// String(x) is the shortest text that reads back to the same double.
const num = (x: number): string => String(x)

// 20·log10(0) is −∞, which no reader takes: below −400 dB (|S| < 1e−20) a value is written as −400 dB.
const FLOOR_DB = -400

function pairText(format: NumberFormat, re: number, im: number): string {
  if (format === 'RI') return `${num(re)} ${num(im)}`
  const magnitude = Math.hypot(re, im)
  const degrees = (Math.atan2(im, re) * 180) / Math.PI
  if (format === 'MA') return `${num(magnitude)} ${num(degrees)}`
  return `${num(Math.max(FLOOR_DB, 20 * Math.log10(magnitude)))} ${num(degrees)}`
}

/** The data restricted to the chosen ports, in the solver's layout. */
function selectPorts(data: TouchstoneData, ports: number[] | undefined): TouchstoneData {
  if (!ports) return data
  const n = data.ports
  for (const p of ports) if (!Number.isInteger(p) || p < 1 || p > n) throw new RangeError(`port ${p} is not one of the data's ${n} ports`)
  if (new Set(ports).size !== ports.length) throw new RangeError('a port is chosen twice')
  const m = ports.length
  const count = data.frequencies.length
  const re = new Float64Array(count * m * m), im = new Float64Array(count * m * m)
  for (let k = 0; k < count; k++) {
    for (let i = 0; i < m; i++) {
      for (let j = 0; j < m; j++) {
        const from = (k * n + ports[i]! - 1) * n + ports[j]! - 1
        re[(k * m + i) * m + j] = data.re[from]!
        im[(k * m + i) * m + j] = data.im[from]!
      }
    }
  }
  const sameTwoPort = m === 2 && n === 2 && ports[0] === 1 && ports[1] === 2
  return { ports: m, impedances: ports.map(p => data.impedances[p - 1]!), frequencies: data.frequencies, re, im, ...(sameTwoPort && data.noise ? { noise: data.noise } : {}) }
}

/**
 * Writes S-parameters as a Touchstone file. Equal port impedances give version 1.1
 * (`# HZ S RI R z`); unequal ones give version 2.0 with [Reference]. Two-ports are written
 * S11 S21 S12 S22; three and four ports one matrix row per line; five or more at most four
 * pairs per line, each row starting a new line. Two-port noise data follows the network data
 * (version 1.1: R-normalised noise resistance; version 2.0: [Noise Data] in ohms).
 */
export function writeTouchstone(input: TouchstoneData, options: TouchstoneOptions = {}): string {
  const data = selectPorts(input, options.ports)
  const n = data.ports
  const format = options.format ?? 'RI'
  const unit = options.unit ?? 'HZ'
  const scale = FREQUENCY_UNITS[unit]
  const z0 = data.impedances[0] ?? 50
  const uniform = data.impedances.every(z => z === z0)
  const noise = n === 2 && data.noise?.length ? data.noise : undefined
  const lastFrequency = data.frequencies[data.frequencies.length - 1] ?? 0
  // Version 1 tells noise rows from network rows by the frequency dropping back.
  const noiseFitsVersion1 = !noise || noise[0]!.frequency <= lastFrequency
  const version = options.version ?? (uniform && noiseFitsVersion1 ? '1.1' : '2.0')
  if (version === '1.1' && !uniform) throw new RangeError('version 1.1 has one reference impedance for every port; these ports differ')
  if (version === '1.1' && !noiseFitsVersion1) throw new RangeError('version 1.1 noise data must start at or below the last network frequency')
  const explicit = options.version === '2.0'
  const lines: string[] = (options.comments ?? []).map(c => `! ${c}`)
  if (options.caution) lines.push(`! ${SAFETY_NOTE}`)
  const optionLine = `# ${unit} S ${format} R ${num(z0)}`
  if (version === '1.1') {
    lines.push(optionLine)
  } else {
    lines.push('[Version] 2.0', optionLine, `[Number of Ports] ${n}`)
    if (n === 2) lines.push('[Two-Port Data Order] 21_12')
    lines.push(`[Number of Frequencies] ${data.frequencies.length}`)
    if (noise) lines.push(`[Number of Noise Frequencies] ${noise.length}`)
    lines.push(`[Reference] ${data.impedances.map(num).join(' ')}`)
    if (explicit) lines.push('[Matrix Format] Full')
    lines.push('[Network Data]')
  }
  const pairs = (k: number, cells: Array<[number, number]>): string => cells.map(([i, j]) => {
    const at = (k * n + i) * n + j
    return pairText(format, data.re[at]!, data.im[at]!)
  }).join('  ')
  for (let k = 0; k < data.frequencies.length; k++) {
    const f = num(data.frequencies[k]! / scale)
    if (n === 1) lines.push(`${f} ${pairs(k, [[0, 0]])}`)
    else if (n === 2) lines.push(`${f} ${pairs(k, [[0, 0], [1, 0], [0, 1], [1, 1]])}`)
    else {
      for (let i = 0; i < n; i++) {
        for (let start = 0; start < n; start += n <= 4 ? n : 4) {
          const width = n <= 4 ? n : Math.min(4, n - start)
          const cells = Array.from({ length: width }, (_, c): [number, number] => [i, start + c])
          const text = pairs(k, cells)
          lines.push(i === 0 && start === 0 ? `${f} ${text}` : `  ${text}`)
        }
      }
    }
  }
  if (noise) {
    if (version === '2.0') lines.push('[Noise Data]')
    const rnScale = version === '1.1' ? z0 : 1
    for (const p of noise) lines.push(`${num(p.frequency / scale)} ${num(p.nfMinDb)} ${num(p.gammaOptMagnitude)} ${num(p.gammaOptDegrees)} ${num(p.rnOhms / rnScale)}`)
  }
  if (version === '2.0') lines.push('[End]')
  return `${lines.join('\n')}\n`
}
