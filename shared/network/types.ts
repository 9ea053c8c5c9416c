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
  /** RMS surface roughness of the conductor (m); Portwright's extension of the contract. */
  roughness?: ParamValue
  [extra: string]: unknown
}

/** A frequency band as written: ends in Hz or expressions with units. */
export interface SpecBand {
  start: ParamValue
  stop: ParamValue
}

/** A spec condition as written (contract 1.1); ports count from 1, levels in dB, angles in degrees. */
export type SpecConditionSpec =
  | { measure: 'returnLoss'; port: number; min: number }
  | { measure: 'vswr'; port: number; max: number }
  | { measure: 'insertionLoss' | 'isolation' | 'coupling'; from: number; to: number; min?: number; max?: number }
  | { measure: 'amplitudeImbalance'; from: number; to: [number, number]; max: number }
  | { measure: 'phaseDifference'; from: number; to: [number, number]; target: number; tolerance: number }

/** The design's goals (contract 1.1): met when every condition holds at every sweep frequency in `band`, or at `center`. */
export interface SpecDocument {
  center: ParamValue
  band?: SpecBand
  conditions: SpecConditionSpec[]
  [extra: string]: unknown
}

/** What an optimiser may change (`BLOCK.param` or a variable name) and within what range. */
export interface TunableSpec {
  min: ParamValue
  max: ParamValue
  [extra: string]: unknown
}

/** Manufacturing spread of a value: relative (fraction) or absolute; `normal` takes it as 3σ. */
export type ToleranceSpec =
  & ({ relative: number; absolute?: never } | { absolute: ParamValue; relative?: never })
  & { distribution?: 'uniform' | 'normal'; [extra: string]: unknown }

/** Document versions this code reads: 1, and 1.1 with its optional keys. */
export type DocumentVersion = 1 | 1.1

/** The whole network document, version 1 or 1.1. Unknown extra keys are kept. */
export interface NetworkDocument {
  format: 'portwright.network'
  version: DocumentVersion
  name?: string
  referenceImpedance?: ParamValue
  variables?: Record<string, ParamValue>
  sweep?: Sweep
  substrates?: Record<string, Substrate>
  blocks: BlockSpec[]
  wires: Wire[]
  /** Contract 1.1: goals, what may be tuned, manufacturing spread. */
  spec?: SpecDocument
  tunables?: Record<string, TunableSpec>
  tolerances?: Record<string, ToleranceSpec>
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
  /** `referenceImpedance`, `sweep.start`, `sweep.stop`, `sweep.points`, and `substrates.NAME.KEY` for each substrate value. */
  settings: Record<string, EvaluatedValue>
}
