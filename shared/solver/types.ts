import type { MicrostripSubstrate } from '../microstrip/types'
import type { ParamSpec, ParamValues } from '../network/params'
import type { Problem } from '../network/types'

/**
 * A block at solve time: its scattering matrix at any frequency, referred to its own
 * real reference impedance per terminal. The joining algorithm renormalises where
 * terminals of different references meet.
 */
export interface BlockInstance {
  terminals: number
  /** Reference impedance (Ω) of each terminal, the one `fill` writes S for. */
  refs: Float64Array
  /** S = Sᵀ; when every block is reciprocal the join computes one triangle only. */
  reciprocal: boolean
  /** S does not depend on frequency; it is filled once. */
  constant: boolean
  /**
   * Writes S at frequency f (Hz) into re/im, row-major terminals×terminals.
   * Returns false when it cannot (the reason is then given by `failure`).
   */
  fill(frequency: number, re: Float64Array, im: Float64Array): boolean
  /**
   * Instances with the same key always have the same S (same type and parameters), so the
   * solver fills one buffer for all of them.
   */
  shareKey?: string
  /** Why the last `fill` failed. */
  failure?(): Problem | undefined
  /** Set on port blocks only: they mark an external port and are not joined as elements. */
  port?: { index: number; impedance: number }
}

/** Solves a network document at one frequency for a block that contains a whole network. */
export interface NestedNetwork {
  ports: number
  impedances: number[]
  reciprocal: boolean
  /** Writes the ports×ports S at f into re/im; false when singular (see failure). */
  solveAt(frequency: number, re: Float64Array, im: Float64Array): boolean
  failure(): Problem | undefined
}

/** S-parameters sampled over frequency, as a `data` block uses them (a read Touchstone file is one). */
export interface DataSet {
  ports: number
  /** Reference impedance of each port (Ω, real, > 0). */
  impedances: readonly number[]
  /** Hz, strictly increasing, at least one. */
  frequencies: Float64Array
  /** S(i+1)(j+1) at frequency k at index (k·ports + i)·ports + j. */
  re: Float64Array
  im: Float64Array
}

/** What a block model may ask for while building its instance. */
export interface CreateContext {
  blockId: string
  referenceImpedance: number
  /** Builds a nested network from a document (for blocks made of other blocks). */
  buildNetwork(document: unknown, label: string): NestedOutcome
  /** Resolves and builds a subnetwork by reference, through the caller's resolver. */
  resolveNetwork(ref: string): NestedOutcome
  /** Loads a data set by reference, through the caller's resolver, checked for shape. */
  resolveData(ref: string): { ok: true; data: DataSet } | { ok: false; problems: Problem[] }
  /** The document's substrate of that name, evaluated; a message naming the known ones when there is none. */
  substrate(name: string): SubstrateLookup
}

/** A nested network built for a block, with the range warnings of the blocks inside it (messages say where). */
export type NestedOutcome = { ok: true; network: NestedNetwork; notes: ModelNote[] } | { ok: false; problems: Problem[] }

/** Outcome of looking up a substrate by name. */
export type SubstrateLookup = { ok: true; substrate: MicrostripSubstrate } | { ok: false; message: string }

/**
 * A block model used outside its published range: the result is still given, with this warning.
 * With `above` (Hz) it applies only when the sweep goes above that frequency.
 */
export interface ModelNote {
  field?: string
  message: string
  above?: number
}

/** Result of building a block instance. Problem messages name the field but not the block; the caller adds it. */
export type CreateOutcome = { ok: true; instance: BlockInstance; notes?: ModelNote[] } | { ok: false; problems: Array<{ field?: string; message: string }> }

/** A block type: its parameters, cross-parameter checks and how to build its instance. */
export interface BlockModel {
  type: string
  /** One line for the editor's palette and for documentation. */
  description: string
  params: Record<string, ParamSpec>
  /** Number of terminals when fixed by the type (a subnetwork's depends on its document). */
  terminals?: number
  /** Checks that involve several parameters; messages name the field. */
  check?(values: ParamValues): Array<{ field?: string; message: string }>
  /** Builds the instance from checked parameter values. */
  create(values: ParamValues, context: CreateContext): CreateOutcome
}
