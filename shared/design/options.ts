import { evaluateQuantity } from '../network/expression'
import type { QuantityKind } from '../network/quantities'
import type { NetworkDocument } from '../network/types'
import { designCoupledLine } from './coupled-line'
import { designDivider } from './divider'
import { designQuadrature } from './quadrature'
import { designRing } from './ring'
import { chebyshevSecant } from './transformer-sections'
import { designTransformer, DEFAULT_MAX_REFLECTION } from './transformer'
import type { DesignKind } from './types'
import { branchLineWithTees } from './branch-line-tees'
import { coupledLineInMicrostrip } from './coupled-microstrip'
import { inMicrostrip, remeasureBand } from './microstrip-medium'

/** One option of an assistant, as the command line spells it (without the leading --). */
export interface DesignOption {
  name: string
  /** Words for the dialog's label. */
  label: string
  kind: QuantityKind | 'choice'
  required: boolean
  choices?: readonly string[]
  /** Inclusive range in SI units (dB for decibels). */
  min?: number
  max?: number
  /** Exclusive lower bound. */
  above?: number
  integer?: boolean
  /** Shown when absent; the assistant's own default. */
  placeholder?: string
}

/** A problem with one option, in the user's words. */
export interface OptionProblem {
  option: string
  message: string
}

type Values = Record<string, number | string>

interface Assistant {
  kind: DesignKind
  /** One line for the command's usage and the dialog. */
  summary: string
  options: readonly DesignOption[]
  /** Checks that involve several options. */
  check?(values: Values): OptionProblem[]
  design(values: Values): NetworkDocument
}

const frequency: DesignOption = { name: 'frequency', label: 'Centre frequency', kind: 'frequency', required: true, above: 0, max: 1e12 }
const impedance: DesignOption = { name: 'impedance', label: 'System impedance Z0', kind: 'impedance', required: true, above: 0, max: 1e4 }

/**
 * Options of our own that place the design in microstrip on a substrate instead of ideal lines:
 * permittivity and height together choose microstrip; the rest default to a zero-thickness,
 * lossless, smooth strip. `coupled-line` becomes a `coupledMicrostrip` block (Garg & Bahl's quasi-static model).
 */
export const SUBSTRATE_OPTIONS: readonly DesignOption[] = [
  { name: 'substrate-permittivity', label: 'Microstrip: relative permittivity εr (empty: ideal lines)', kind: 'ratio', required: false, min: 1, max: 128 },
  { name: 'substrate-height', label: 'Microstrip: substrate height', kind: 'length', required: false, above: 0, max: 0.1 },
  { name: 'substrate-thickness', label: 'Microstrip: strip thickness', kind: 'length', required: false, min: 0, max: 0.01, placeholder: '0' },
  { name: 'substrate-loss-tangent', label: 'Microstrip: loss tangent', kind: 'ratio', required: false, min: 0, max: 1, placeholder: '0' },
  { name: 'substrate-conductivity', label: 'Microstrip: conductivity (S/m; empty: lossless)', kind: 'conductivity', required: false, above: 0, max: 1e9 },
]

/**
 * Of our own, quadrature only: in microstrip, draw each junction as a `microstripTee` (with steps to the
 * ports' strips) and lengthen the arms so the design centres on f0 again (`tee`, the default), or keep
 * ideal nodes with arms measured centre to centre (`ideal`).
 */
export const JUNCTIONS_OPTION: DesignOption = { name: 'substrate-junctions', label: 'Microstrip: junctions (tee: tee models, arms compensated; ideal: plain nodes)', kind: 'choice', required: false, choices: ['tee', 'ideal'], placeholder: 'tee' }
const SUBSTRATE_NAMES = new Set([...SUBSTRATE_OPTIONS, JUNCTIONS_OPTION].map(o => o.name))

/** Whether an option places the design on a substrate (the dialog groups these). */
export function isSubstrateOption(name: string): boolean {
  return SUBSTRATE_NAMES.has(name)
}

/** Every assistant by KIND, with its options: the one table the command and the dialog read. */
export const DESIGN_ASSISTANTS: Readonly<Record<DesignKind, Assistant>> = {
  'quadrature': {
    kind: 'quadrature',
    summary: 'Branch-line quadrature hybrid: 1 in, 2 through, 3 coupled, 4 isolated',
    options: [
      frequency, impedance,
      { name: 'coupling-db', label: 'Coupling to port 3', kind: 'decibel', required: false, min: 1, max: 15, placeholder: '3.0103' },
      { name: 'sections', label: 'Sections', kind: 'choice', required: false, choices: ['1', '2', '3'], placeholder: '1' },
      ...SUBSTRATE_OPTIONS,
      JUNCTIONS_OPTION,
    ],
    check(v) {
      // Two sections at 10 dB already need outer branches of 6.2·Z0; weaker coupling only gets worse.
      const db = v['coupling-db'] as number | undefined
      return db !== undefined && db > 10 && v.sections !== undefined && v.sections !== '1'
        ? [{ option: 'coupling-db', message: `must be at most 10 dB with ${v.sections} sections (weaker coupling needs branch lines far above 3·Z0); use one section` }]
        : []
    },
    design: v => designQuadrature({ frequency: v.frequency as number, impedance: v.impedance as number, couplingDb: v['coupling-db'] as number | undefined, sections: v.sections === undefined ? 1 : (Number(v.sections) as 1 | 2 | 3) }),
  },
  'ring': {
    kind: 'ring',
    summary: '180° ring hybrid: 1 sum, 2 and 3 outputs, 4 difference',
    options: [frequency, impedance, ...SUBSTRATE_OPTIONS],
    design: v => designRing({ frequency: v.frequency as number, impedance: v.impedance as number }),
  },
  'divider': {
    kind: 'divider',
    summary: 'In-phase divider with isolation resistor: 1 in, 2 and 3 out',
    options: [frequency, impedance, { name: 'ratio-db', label: 'Power at 2 over 3', kind: 'decibel', required: false, min: -10, max: 10, placeholder: '0' }, ...SUBSTRATE_OPTIONS],
    design: v => designDivider({ frequency: v.frequency as number, impedance: v.impedance as number, ratioDb: v['ratio-db'] as number | undefined }),
  },
  'transformer': {
    kind: 'transformer',
    summary: 'Quarter-wave transformer from Z0 (port 1) to a load (port 2)',
    options: [
      frequency, impedance,
      { name: 'load', label: 'Load impedance', kind: 'impedance', required: true, above: 0, max: 1e4 },
      { name: 'sections', label: 'Sections', kind: 'count', required: true, min: 1, max: 8, integer: true },
      { name: 'response', label: 'Response', kind: 'choice', required: true, choices: ['binomial', 'chebyshev'] },
      { name: 'max-reflection', label: 'Largest reflection |Γ|', kind: 'ratio', required: false, above: 0, max: 0.5, placeholder: String(DEFAULT_MAX_REFLECTION) },
      ...SUBSTRATE_OPTIONS,
    ],
    check(v) {
      const problems: OptionProblem[] = []
      const z0 = v.impedance as number, zl = v.load as number
      if (Math.abs(zl - z0) <= 1e-9 * z0) problems.push({ option: 'load', message: `equals the system impedance (${z0} Ω): there is nothing to transform` })
      else if (v.response === 'chebyshev') {
        const gm = (v['max-reflection'] as number | undefined) ?? DEFAULT_MAX_REFLECTION
        if (chebyshevSecant(z0, zl, v.sections as number, gm) === undefined) {
          problems.push({ option: 'max-reflection', message: `must be below ${(Math.abs(Math.log(zl / z0)) / 2).toPrecision(3)} for a ${zl} Ω load on ${z0} Ω: the load alone reflects less than that` })
        }
      }
      return problems
    },
    design: v => designTransformer({ frequency: v.frequency as number, impedance: v.impedance as number, load: v.load as number, sections: v.sections as number, response: v.response as 'binomial' | 'chebyshev', maxReflection: v['max-reflection'] as number | undefined }),
  },
  'coupled-line': {
    kind: 'coupled-line',
    summary: 'Quarter-wave coupled-line coupler: 1 in, 2 through, 3 coupled, 4 isolated',
    options: [frequency, impedance, { name: 'coupling-db', label: 'Coupling to port 3', kind: 'decibel', required: true, min: 3, max: 40 }, ...SUBSTRATE_OPTIONS],
    design: v => designCoupledLine({ frequency: v.frequency as number, impedance: v.impedance as number, couplingDb: v['coupling-db'] as number }),
  },
}

/** The KINDs in the order the command lists them. */
export const DESIGN_KINDS = Object.keys(DESIGN_ASSISTANTS) as DesignKind[]

/** Whether a word names an assistant. */
export function isDesignKind(word: string): word is DesignKind {
  return Object.hasOwn(DESIGN_ASSISTANTS, word)
}

function readOption(option: DesignOption, text: string): { ok: true; value: number | string } | { ok: false; message: string } {
  if (option.kind === 'choice') {
    const choices = option.choices!
    const words = choices.length > 2 ? `${choices.slice(0, -1).join(', ')} or ${choices.at(-1)}` : choices.join(' or ')
    return choices.includes(text) ? { ok: true, value: text } : { ok: false, message: `must be ${words} (got "${text}")` }
  }
  const numeric = Number(text)
  const outcome = evaluateQuantity(text.trim() !== '' && Number.isFinite(numeric) ? numeric : text, option.kind, new Map())
  if (!outcome.ok) return { ok: false, message: outcome.error }
  const v = outcome.value
  if (option.integer && !Number.isInteger(v)) return { ok: false, message: `must be a whole number (got ${text})` }
  if (option.above !== undefined && !(v > option.above)) return { ok: false, message: `must be greater than ${option.above} (got ${text})` }
  if ((option.min !== undefined && v < option.min) || (option.max !== undefined && v > option.max)) {
    return { ok: false, message: `must be between ${option.min ?? option.above} and ${option.max} (got ${text})` }
  }
  return { ok: true, value: v }
}

/**
 * Reads an assistant's options as typed (numbers in SI or values with units such as
 * "2.45 GHz") and builds its document, or returns every problem, each naming its option.
 */
export function runDesign(kind: DesignKind, given: Record<string, string>): { ok: true; document: NetworkDocument } | { ok: false; problems: OptionProblem[] } {
  const assistant = DESIGN_ASSISTANTS[kind]
  const problems: OptionProblem[] = []
  const values: Values = {}
  const known = new Set(assistant.options.map(o => o.name))
  for (const name of Object.keys(given)) {
    if (!known.has(name)) problems.push({ option: name, message: `is not an option of ${kind} (it takes ${assistant.options.map(o => `--${o.name}`).join(', ')})` })
  }
  for (const option of assistant.options) {
    const text = given[option.name]
    if (text === undefined) {
      if (option.required) problems.push({ option: option.name, message: `is required (${option.label.toLowerCase()})` })
      continue
    }
    const read = readOption(option, text)
    if (read.ok) values[option.name] = read.value
    else problems.push({ option: option.name, message: read.message })
  }
  if (!problems.length && assistant.check) problems.push(...assistant.check(values))
  const hasPermittivity = values['substrate-permittivity'] !== undefined, hasHeight = values['substrate-height'] !== undefined
  const substrateGiven = [...SUBSTRATE_NAMES].some(n => values[n] !== undefined)
  if (substrateGiven && !hasPermittivity && given['substrate-permittivity'] === undefined) problems.push({ option: 'substrate-permittivity', message: 'is required for a design in microstrip (with --substrate-height)' })
  if (substrateGiven && !hasHeight && given['substrate-height'] === undefined) problems.push({ option: 'substrate-height', message: 'is required for a design in microstrip (with --substrate-permittivity)' })
  if (problems.length) return { ok: false, problems }
  const ideal = assistant.design(values)
  if (!hasPermittivity || !hasHeight) return { ok: true, document: ideal }
  const substrate = {
    permittivity: values['substrate-permittivity'] as number,
    height: values['substrate-height'] as number,
    thickness: (values['substrate-thickness'] as number | undefined) ?? 0,
    lossTangent: (values['substrate-loss-tangent'] as number | undefined) ?? 0,
    conductivity: values['substrate-conductivity'] as number | undefined,
    roughness: 0,
  }
  try {
    const f0 = values.frequency as number
    if (kind === 'coupled-line') return { ok: true, document: coupledLineInMicrostrip(ideal, substrate, f0) }
    const placed = inMicrostrip(ideal, substrate, f0)
    if (kind !== 'quadrature' || values['substrate-junctions'] === 'ideal') return { ok: true, document: placed }
    const { document } = branchLineWithTees(placed, substrate, f0, values.impedance as number, true)
    document.name = `${document.name}, tee junctions`
    remeasureBand(document, f0)
    return { ok: true, document }
  } catch (error) {
    return { ok: false, problems: [{ option: 'substrate-permittivity', message: `this board cannot carry the design: ${(error as Error).message}` }] }
  }
}
