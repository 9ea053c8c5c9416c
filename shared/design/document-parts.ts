import { findBandwidth } from '../rf/find-bandwidth'
import type { SpecCondition } from '../rf/spec-mask'
import type { BlockSpec, NetworkDocument, ParamValue, Wire } from '../network/types'
import { solveDocument } from '../solver/index'

/** Pixels between neighbouring block positions on the editor grid (20 px steps). */
export const STEP = 120

/** A frequency as a readable expression with an SI prefix, e.g. 2.45e9 → "2.45 GHz". */
export function frequencyText(hz: number): string {
  const [scale, unit] = hz >= 1e9 ? [1e9, 'GHz'] : hz >= 1e6 ? [1e6, 'MHz'] : hz >= 1e3 ? [1e3, 'kHz'] : [1, 'Hz']
  return `${Number((hz / scale).toPrecision(10))} ${unit}`
}

/** A number rounded to 10 significant digits, so documents stay short and readable. */
export const tidy = (x: number): number => Number(x.toPrecision(10))

/** An impedance written as a multiple of the variable Z0, so the design follows a change of Z0. */
export function timesZ0(factor: number): string {
  const f = tidy(factor)
  if (f === 1) return 'Z0'
  if (Math.abs(f - Math.SQRT2) < 1e-9) return 'sqrt(2) * Z0'
  if (Math.abs(f - Math.SQRT1_2) < 1e-9) return 'Z0 / sqrt(2)'
  return `${f} * Z0`
}

/** A port block at a grid position; `flip` puts its terminal on the left (for ports on the right). */
export function portBlock(id: string, index: number, x: number, y: number, flip = false, impedance?: ParamValue): BlockSpec {
  return { id, type: 'port', params: impedance === undefined ? { index } : { index, impedance }, layout: flip ? { x, y, flip } : { x, y } }
}

/** An ideal line `degrees` long at f0 (default a quarter wave); rotation 90 draws it downwards. */
export function lineBlock(id: string, impedance: ParamValue, x: number, y: number, options: { degrees?: number; rotation?: 0 | 90 | 180 | 270 } = {}): BlockSpec {
  const layout = options.rotation ? { x, y, rotation: options.rotation } : { x, y }
  return { id, type: 'line', params: { impedance, degrees: options.degrees ?? 90, at: 'f0' }, layout }
}

/** What an assistant hands to `finishDesign`. */
export interface DesignParts {
  name: string
  frequency: number
  impedance: number
  /** Variables beyond f0 and Z0. */
  variables?: Record<string, ParamValue>
  blocks: BlockSpec[]
  wires: Wire[]
  /** Sweep from (1 − span)·f0 to (1 + span)·f0. */
  span: number
  conditions: SpecCondition[]
}

/**
 * Assembles a version-1.1 document with a sweep around f0 and a spec whose band is the widest
 * band, symmetric about f0 and rounded down to 0.5 % of f0, over which the solved design meets
 * every condition: the spec states what the placed design does, checked by the solver.
 */
export function finishDesign(parts: DesignParts): NetworkDocument {
  const document: NetworkDocument = {
    format: 'portwright.network',
    version: 1.1,
    name: parts.name,
    referenceImpedance: tidy(parts.impedance),
    variables: { f0: frequencyText(parts.frequency), Z0: `${tidy(parts.impedance)} ohm`, ...parts.variables },
    sweep: { start: frequencyText((1 - parts.span) * parts.frequency), stop: frequencyText((1 + parts.span) * parts.frequency), points: 401, spacing: 'linear' },
    blocks: parts.blocks,
    wires: parts.wires,
    spec: { center: 'f0', conditions: parts.conditions },
  }
  const half = metHalfWidth(document, parts.frequency, parts.conditions)
  if (half !== undefined && half > 0) document.spec!.band = { start: `${tidy(1 - half)} * f0`, stop: `${tidy(1 + half)} * f0` }
  return document
}

/** Half the fractional band (a multiple of 0.005) over which the solved document meets the conditions. */
export function metHalfWidth(document: NetworkDocument, center: number, conditions: SpecCondition[]): number | undefined {
  const solved = solveDocument(document)
  if (!solved.ok) throw new Error(`the designed network cannot be solved: ${solved.problems.map(p => p.message).join('; ')}`)
  const band = findBandwidth(solved.result, { center, conditions })
  if (!band.ok) return undefined
  const half = Math.min(center - band.low, band.high - center) / center
  return Math.floor(half * 200 + 1e-9) / 200
}
