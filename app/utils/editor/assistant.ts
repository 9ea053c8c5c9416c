/**
 * Pure parts of the design-assistant dialog: build and solve a design from the typed inputs
 * (the same assistants and options as `npm run -s design`), summarise what it will do, and
 * turn it into what the editor places.
 */
import { runDesign, type DesignKind, type OptionProblem } from '~~/shared/design/index'
import { resolveSpec } from '~~/shared/network/spec'
import type { BlockSpec, NetworkDocument, ParamValue, Wire } from '~~/shared/network/types'
import { conditionMargin, describeCondition, findBandwidth } from '~~/shared/rf/index'
import { solveDocument } from '~~/shared/solver/index'
import type { Fragment } from './documentOps'
import { layoutOf } from './documentOps'

/** One spec condition and how it fares over the design's spec band (or at the centre). */
export interface ConditionSummary {
  text: string
  /** Smallest margin over the band: ≥ 0 holds, in `unit`. */
  worstMargin: number
  /** ' dB', '°' or '' (a VSWR margin is a plain ratio). */
  unit: string
}

/** What the dialog shows before placing. */
export type DesignPreview =
  | {
    ok: true
    document: NetworkDocument
    center: number
    /** The band over which the solved design meets its spec, with its width over the centre. */
    band?: { start: number, stop: number, fractional: number }
    /** The widest band around the centre meeting every condition (from the solve, unrounded). */
    reach?: { low: number, high: number, fractional: number }
    conditions: ConditionSummary[]
    blockCount: number
  }
  | { ok: false, problems: OptionProblem[] }

/** Designs and solves; problems name the option as the dialog labels it. */
export function previewDesign(kind: DesignKind, inputs: Record<string, string>): DesignPreview {
  const given = Object.fromEntries(Object.entries(inputs).filter(([, v]) => v.trim() !== '')) as Record<string, string>
  const designed = runDesign(kind, given)
  if (!designed.ok) return designed
  const document = designed.document
  const solved = solveDocument(document)
  const resolved = resolveSpec(document)
  if (!solved.ok || !resolved?.ok) return { ok: false, problems: [{ option: 'frequency', message: 'the designed network could not be solved' }] }
  const spec = resolved.spec
  const f = solved.result.frequencies
  const inBand = (k: number) => spec.band ? f[k]! >= spec.band.start && f[k]! <= spec.band.stop : k === nearestIndex(f, spec.center)
  const conditions = spec.conditions.map((condition) => {
    const margin = conditionMargin(solved.result, condition)
    let worst = Infinity
    margin.forEach((m, k) => { if (inBand(k)) worst = Math.min(worst, m) })
    const unit = condition.measure === 'phaseDifference' ? '°' : condition.measure === 'vswr' ? '' : ' dB'
    return { text: describeCondition(condition), worstMargin: worst, unit }
  })
  const found = findBandwidth(solved.result, spec)
  return {
    ok: true,
    document,
    center: spec.center,
    band: spec.band ? { ...spec.band, fractional: (spec.band.stop - spec.band.start) / spec.center } : undefined,
    reach: found.ok ? { low: found.low, high: found.high, fractional: found.fractional } : undefined,
    conditions,
    blockCount: document.blocks.length,
  }
}

function nearestIndex(f: Float64Array, x: number): number {
  let best = 0
  f.forEach((v, k) => { if (Math.abs(v - x) < Math.abs(f[best]! - x)) best = k })
  return best
}

/** How a design goes into the open network. */
export type Placement =
  | { mode: 'replace', document: NetworkDocument }
  /** `version` is set when the fragment uses a block type of contract 1.1 (coupled lines). */
  | { mode: 'add', fragment: Fragment, offset: { x: number, y: number }, version?: 1.1 }

/**
 * An empty network becomes the design (variables, sweep and spec included, the network keeps its
 * name). Otherwise the design's blocks and wires are added to the right of what is there, with
 * every value written out in SI (the design's variables may clash with the network's) and ports
 * numbered after the existing ones.
 */
export function placeDesign(current: NetworkDocument, design: NetworkDocument): Placement {
  if (!current.blocks.length) return { mode: 'replace', document: { ...structuredClone(design), name: current.name || design.name } }
  const solved = solveDocument(design)
  const evaluated = solved.evaluated.blocks
  const blocks: BlockSpec[] = design.blocks.map((block) => {
    const params: Record<string, ParamValue> = {}
    for (const [key, value] of Object.entries(block.params)) {
      const number = evaluated[block.id]?.[key]?.value
      params[key] = typeof value === 'string' && number !== undefined ? number : value
    }
    return { ...structuredClone(block), params }
  })
  const wires = design.wires.map(([a, b]) => [a, b] as Wire)
  const right = Math.max(...current.blocks.map((b, i) => layoutOf(b, i).x)) + 200
  const top = Math.min(...current.blocks.map((b, i) => layoutOf(b, i).y))
  const version = blocks.some(b => b.type === 'coupled') ? 1.1 as const : undefined
  return { mode: 'add', fragment: { blocks, wires }, offset: { x: right, y: top }, ...(version ? { version } : {}) }
}
