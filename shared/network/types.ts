/**
 * TypeScript shape of a network document, version 1 (see the network-format contract).
 * Parameter values stay as written (number in SI or expression string); evaluation
 * turns them into numbers.
 */

/** A parameter as written: a number in SI base units or a mathjs expression string. */
export type ParamValue = number | string

/** Where the editor draws a block; the solver ignores it. */
export interface BlockLayout {
  x: number
  y: number
  rotation?: 0 | 90 | 180 | 270
  flip?: boolean
}

/** One block of the network: an instance of a block type with its parameters. */
export interface BlockSpec {
  id: string
  type: string
  params: Record<string, ParamValue>
  layout?: BlockLayout
  [extra: string]: unknown
}

/** An unordered pair of terminals written `BLOCK.N`. */
export type Wire = [string, string]

/** Frequency sweep as written in the document. */
export interface Sweep {
  start: ParamValue
  stop: ParamValue
  points?: number
  spacing?: 'linear' | 'log'
  [extra: string]: unknown
}

/** A planar substrate, named in `substrates`. */
export interface Substrate {
  permittivity: ParamValue
  height: ParamValue
  thickness?: ParamValue
  lossTangent?: ParamValue
  conductivity?: ParamValue
  [extra: string]: unknown
}

/** The whole network document, version 1. Unknown extra keys are kept. */
export interface NetworkDocument {
  format: 'portwright.network'
  version: 1
  name?: string
  referenceImpedance?: ParamValue
  variables?: Record<string, ParamValue>
  sweep?: Sweep
  substrates?: Record<string, Substrate>
  blocks: BlockSpec[]
  wires: Wire[]
  [extra: string]: unknown
}

/** A problem found in a document or while solving it, in plain words. */
export interface Problem {
  block?: string
  field?: string
  message: string
  frequency?: number
}

/** An evaluated parameter as the inspector shows it: value in SI, or the error. */
export interface EvaluatedValue {
  value?: number
  unit?: string
  display?: string
  error?: string
}

/** Every evaluated value of a document, for display beside the fields. */
export interface Evaluated {
  variables: Record<string, EvaluatedValue>
  blocks: Record<string, Record<string, EvaluatedValue>>
  /** `referenceImpedance`, `sweep.start`, `sweep.stop`, `sweep.points`. */
  settings: Record<string, EvaluatedValue>
}
