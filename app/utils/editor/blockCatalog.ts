/**
 * What the editor knows about each block kind: its terminals (numbered as in
 * the network document contract), its starting parameters, the inspector
 * fields and the footprint of its symbol on the grid.
 */

export type BlockKind =
  | 'port' | 'line' | 'stub' | 'load' | 'series'
  | 'hybrid90' | 'hybrid180' | 'divider' | 'phase' | 'attenuator' | 'microstrip' | 'coupled'
  | 'microstripOpen' | 'microstripStep' | 'microstripBend' | 'microstripTee' | 'coupledMicrostrip'

export type ParamValue = number | string

/** One inspector field. `choices` makes it a select; otherwise it takes a number or an expression. */
export interface FieldSpec {
  param: string
  label: string
  /** Unit the value is read in when a bare number is typed (shown as a hint). */
  unit?: string
  choices?: readonly string[]
  /** Shown as the placeholder when the parameter is absent. */
  placeholder?: string
  /** Only shown when this predicate holds for the block's params (e.g. `at` only for branch models). */
  when?: (params: Record<string, ParamValue>) => boolean
  /** A required parameter cannot be cleared. */
  required?: boolean
}

export type Side = 'left' | 'right' | 'top' | 'bottom'

/** A terminal in the symbol's own (unrotated) frame, in grid steps. */
export interface TerminalSpec {
  n: number
  name?: string
  x: number
  y: number
  side: Side
}

export interface KindSpec {
  kind: BlockKind
  label: string
  /** Short explanation for the block rail tooltip. */
  hint: string
  /** Prefix of generated block ids. */
  idPrefix: string
  /** Footprint in grid steps (unrotated). */
  width: number
  height: number
  terminals: readonly TerminalSpec[]
  defaults: Record<string, ParamValue>
  fields: readonly FieldSpec[]
}

/** Pixels per grid step on the canvas. */
export const GRID = 20

const electrical = (p: Record<string, ParamValue>) => p.length === undefined
const physical = (p: Record<string, ParamValue>) => p.length !== undefined
const notIdeal = (p: Record<string, ParamValue>) => p.model !== undefined && p.model !== 'ideal'

const lineFields: FieldSpec[] = [
  { param: 'impedance', label: 'Impedance', unit: 'Ω', required: true },
  { param: 'degrees', label: 'Electrical length', unit: '°', when: electrical },
  { param: 'at', label: 'at frequency', unit: 'Hz', when: electrical },
  { param: 'length', label: 'Physical length', unit: 'm', when: physical },
  { param: 'velocityFactor', label: 'Velocity factor', placeholder: '1', when: physical },
  { param: 'lossDb', label: 'Loss per wavelength', unit: 'dB', placeholder: '0' },
]

// Length fields of a line without its impedance (coupled lines give two impedances instead).
const lengthFields = lineFields.filter(f => f.param !== 'impedance')

const rlcFields: FieldSpec[] = [
  { param: 'resistance', label: 'Resistance', unit: 'Ω', placeholder: '0' },
  { param: 'inductance', label: 'Inductance', unit: 'H', placeholder: '0' },
  { param: 'capacitance', label: 'Capacitance', unit: 'F', placeholder: 'none' },
]

const two = (w: number, h: number): TerminalSpec[] => [
  { n: 1, x: 0, y: h / 2, side: 'left' },
  { n: 2, x: w, y: h / 2, side: 'right' },
]

const impedanceField: FieldSpec = { param: 'impedance', label: 'Impedance', unit: 'Ω', placeholder: 'reference' }

export const blockCatalog: Record<BlockKind, KindSpec> = {
  port: {
    kind: 'port', label: 'Port', hint: 'Where signals enter and leave; numbered 1…N', idPrefix: 'P',
    width: 2, height: 2, terminals: [{ n: 1, x: 2, y: 1, side: 'right' }],
    defaults: { index: 1 },
    fields: [
      { param: 'index', label: 'Port number', required: true },
      impedanceField,
    ],
  },
  line: {
    kind: 'line', label: 'Line', hint: 'Transmission line: impedance and electrical length', idPrefix: 'LN',
    width: 4, height: 2, terminals: two(4, 2),
    defaults: { impedance: 50, degrees: 90, at: '1 GHz' },
    fields: lineFields,
  },
  stub: {
    kind: 'stub', label: 'Stub', hint: 'Line to ground, open or shorted at its far end', idPrefix: 'ST',
    width: 4, height: 2, terminals: [{ n: 1, x: 0, y: 1, side: 'left' }],
    defaults: { impedance: 50, degrees: 45, at: '1 GHz', end: 'open' },
    fields: [...lineFields, { param: 'end', label: 'Far end', choices: ['open', 'short'], required: true }],
  },
  load: {
    kind: 'load', label: 'Load', hint: 'Series R-L-C to ground, or an open, short or matched end', idPrefix: 'LD',
    width: 2, height: 4, terminals: [{ n: 1, x: 1, y: 0, side: 'top' }],
    defaults: { resistance: 50 },
    fields: [{ param: 'end', label: 'End', choices: ['open', 'short', 'matched'], placeholder: 'R-L-C' }, ...rlcFields.map(f => ({ ...f, when: (p: Record<string, ParamValue>) => p.end === undefined }))],
  },
  series: {
    kind: 'series', label: 'Series R-L-C', hint: 'Series R-L-C between its two terminals', idPrefix: 'Z',
    width: 4, height: 2, terminals: two(4, 2),
    defaults: { capacitance: '1 pF' },
    fields: rlcFields,
  },
  hybrid90: {
    kind: 'hybrid90', label: '90° hybrid', hint: 'Quadrature hybrid: 1 in, 2 through, 3 coupled, 4 isolated', idPrefix: 'HQ',
    width: 4, height: 4,
    terminals: [
      { n: 1, name: 'in', x: 0, y: 1, side: 'left' },
      { n: 2, name: 'through', x: 4, y: 1, side: 'right' },
      { n: 3, name: 'coupled', x: 4, y: 3, side: 'right' },
      { n: 4, name: 'isolated', x: 0, y: 3, side: 'left' },
    ],
    defaults: { model: 'ideal' },
    fields: [
      impedanceField,
      { param: 'model', label: 'Model', choices: ['ideal', 'branch'], required: true },
      { param: 'at', label: 'Quarter wave at', unit: 'Hz', when: notIdeal },
      { param: 'couplingDb', label: 'Coupling', unit: 'dB', placeholder: '3.0103' },
    ],
  },
  coupled: {
    kind: 'coupled', label: 'Coupled lines', hint: 'Coupled-line section: 1 in, 2 through, 3 coupled (beside 1), 4 isolated (beside 2)', idPrefix: 'CP',
    width: 4, height: 6,
    terminals: [
      { n: 1, name: 'in', x: 0, y: 1, side: 'left' },
      { n: 2, name: 'through', x: 4, y: 1, side: 'right' },
      { n: 3, name: 'coupled', x: 0, y: 5, side: 'left' },
      { n: 4, name: 'isolated', x: 4, y: 5, side: 'right' },
    ],
    defaults: { evenImpedance: 69.37, oddImpedance: 36.04, degrees: 90, at: '1 GHz' },
    fields: [
      { param: 'evenImpedance', label: 'Even-mode impedance', unit: 'Ω', required: true },
      { param: 'oddImpedance', label: 'Odd-mode impedance', unit: 'Ω', required: true },
      ...lengthFields,
    ],
  },
  hybrid180: {
    kind: 'hybrid180', label: '180° hybrid', hint: 'Ring hybrid: 1 sum, 2 and 3 outputs, 4 difference', idPrefix: 'HR',
    width: 4, height: 4,
    terminals: [
      { n: 1, name: 'sum', x: 0, y: 1, side: 'left' },
      { n: 2, name: 'out', x: 4, y: 1, side: 'right' },
      { n: 3, name: 'out', x: 4, y: 3, side: 'right' },
      { n: 4, name: 'difference', x: 0, y: 3, side: 'left' },
    ],
    defaults: { model: 'ideal' },
    fields: [
      impedanceField,
      { param: 'model', label: 'Model', choices: ['ideal', 'ring'], required: true },
      { param: 'at', label: 'Ring sized at', unit: 'Hz', when: notIdeal },
    ],
  },
  divider: {
    kind: 'divider', label: 'Divider', hint: 'In-phase divider with isolation resistor: 1 in, 2 and 3 out', idPrefix: 'DV',
    width: 4, height: 4,
    terminals: [
      { n: 1, name: 'in', x: 0, y: 2, side: 'left' },
      { n: 2, name: 'out', x: 4, y: 1, side: 'right' },
      { n: 3, name: 'out', x: 4, y: 3, side: 'right' },
    ],
    defaults: { model: 'ideal' },
    fields: [
      impedanceField,
      { param: 'model', label: 'Model', choices: ['ideal', 'lines'], required: true },
      { param: 'at', label: 'Quarter wave at', unit: 'Hz', when: notIdeal },
      { param: 'ratioDb', label: 'Split 2 over 3', unit: 'dB', placeholder: '0' },
    ],
  },
  phase: {
    kind: 'phase', label: 'Phase step', hint: 'Matched, lossless, fixed phase delay', idPrefix: 'PS',
    width: 4, height: 2, terminals: two(4, 2),
    defaults: { degrees: 45 },
    fields: [impedanceField, { param: 'degrees', label: 'Phase delay', unit: '°', required: true }],
  },
  attenuator: {
    kind: 'attenuator', label: 'Attenuator', hint: 'Matched, fixed loss', idPrefix: 'AT',
    width: 4, height: 2, terminals: two(4, 2),
    defaults: { db: 3 },
    fields: [impedanceField, { param: 'db', label: 'Loss', unit: 'dB', required: true }],
  },
  microstrip: {
    kind: 'microstrip', label: 'Microstrip', hint: 'Microstrip line on a named substrate', idPrefix: 'MT',
    width: 4, height: 2, terminals: two(4, 2),
    defaults: { width: '1.1 mm', length: '20 mm' },
    fields: [
      { param: 'substrate', label: 'Substrate', required: true },
      { param: 'width', label: 'Width', unit: 'm', required: true },
      { param: 'length', label: 'Length', unit: 'm', required: true },
    ],
  },
  microstripOpen: {
    kind: 'microstripOpen', label: 'Microstrip open end', hint: 'Open end of a strip: its fringing field as a little extra length', idPrefix: 'OE',
    width: 3, height: 2, terminals: [{ n: 1, x: 0, y: 1, side: 'left' }],
    defaults: { width: '1.1 mm' },
    fields: [
      { param: 'substrate', label: 'Substrate', required: true },
      { param: 'width', label: 'Width', unit: 'm', required: true },
    ],
  },
  microstripStep: {
    kind: 'microstripStep', label: 'Microstrip step', hint: 'Step in strip width: the parasitics where two widths meet', idPrefix: 'SW',
    width: 4, height: 2, terminals: two(4, 2),
    defaults: { width1: '1.1 mm', width2: '0.5 mm' },
    fields: [
      { param: 'substrate', label: 'Substrate', required: true },
      { param: 'width1', label: 'Width at 1', unit: 'm', required: true },
      { param: 'width2', label: 'Width at 2', unit: 'm', required: true },
    ],
  },
  microstripBend: {
    kind: 'microstripBend', label: 'Microstrip bend', hint: 'Right-angle bend of a strip, square or mitred corner', idPrefix: 'BD',
    width: 3, height: 3,
    terminals: [{ n: 1, x: 0, y: 1, side: 'left' }, { n: 2, x: 2, y: 3, side: 'bottom' }],
    defaults: { width: '1.1 mm', corner: 'mitred' },
    fields: [
      { param: 'substrate', label: 'Substrate', required: true },
      { param: 'width', label: 'Width', unit: 'm', required: true },
      { param: 'corner', label: 'Corner', choices: ['square', 'mitred'], required: true },
    ],
  },
  microstripTee: {
    kind: 'microstripTee', label: 'Microstrip tee', hint: 'Tee junction of strips: main line through 1 and 2, branch at 3 (terminals on the centre lines)', idPrefix: 'TJ',
    width: 4, height: 3,
    terminals: [{ n: 1, x: 0, y: 1, side: 'left' }, { n: 2, x: 4, y: 1, side: 'right' }, { n: 3, x: 2, y: 3, side: 'bottom' }],
    defaults: { mainWidth: '1.1 mm', branchWidth: '1.1 mm' },
    fields: [
      { param: 'substrate', label: 'Substrate', required: true },
      { param: 'mainWidth', label: 'Main line width (1–2)', unit: 'm', required: true },
      { param: 'branchWidth', label: 'Branch width (3)', unit: 'm', required: true },
    ],
  },
  coupledMicrostrip: {
    kind: 'coupledMicrostrip', label: 'Coupled microstrips', hint: 'Two coupled strips on a substrate: 1 in, 2 through, 3 coupled (beside 1), 4 isolated (beside 2)', idPrefix: 'CM',
    width: 4, height: 6,
    terminals: [
      { n: 1, name: 'in', x: 0, y: 1, side: 'left' },
      { n: 2, name: 'through', x: 4, y: 1, side: 'right' },
      { n: 3, name: 'coupled', x: 0, y: 5, side: 'left' },
      { n: 4, name: 'isolated', x: 4, y: 5, side: 'right' },
    ],
    defaults: { width: '1 mm', gap: '0.2 mm', length: '18 mm' },
    fields: [
      { param: 'substrate', label: 'Substrate', required: true },
      { param: 'width', label: 'Width of each strip', unit: 'm', required: true },
      { param: 'gap', label: 'Gap', unit: 'm', required: true },
      { param: 'length', label: 'Length', unit: 'm', required: true },
    ],
  },
}

/** Block kinds in the order the block rail shows them. */
export const railKinds: readonly BlockKind[] = [
  'port', 'line', 'stub', 'load', 'series', 'hybrid90', 'coupled', 'hybrid180', 'divider', 'phase', 'attenuator', 'microstrip',
  'microstripOpen', 'microstripStep', 'microstripBend', 'microstripTee', 'coupledMicrostrip',
]

/** The catalogue entry for a type, or undefined for a type the editor cannot draw. */
export function kindSpec(type: string): KindSpec | undefined {
  return (blockCatalog as Record<string, KindSpec>)[type]
}

/** Number of terminals of a block type (0 when unknown). */
export function terminalCount(type: string): number {
  return kindSpec(type)?.terminals.length ?? 0
}
