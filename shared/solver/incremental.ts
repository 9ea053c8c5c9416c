import type { Evaluated, NetworkDocument } from '../network/types'
import { CompiledNetwork } from './compile'
import type { JoinPlanCache } from './plan-cache'
import type { PreparedNetwork } from './prepare'
import { notesFor, solveNetwork, type SolveOutcome } from './solve'
import type { BlockInstance } from './types'

/**
 * How a solve was done: 'full' joins everything in the usual order; 'joined-last' joins the
 * edited block after everything else and keeps the rest; 'incremental' reuses the kept rest
 * and redoes only the edited block's joins.
 */
export type EditSolveMode = 'full' | 'joined-last' | 'incremental'

/** What decides whether two documents differ in one block only. */
interface EditSnapshot {
  /** Everything but the parameters of non-port blocks: when it changes, nothing is reused. */
  structure: string
  /** Evaluated parameters of each non-port block, by id. */
  blocks: Map<string, string>
}

interface Kept {
  block: string
  compiled: CompiledNetwork
  terminals: number
  reciprocal: boolean
}

/** Options of `EditSolver`. */
export interface EditSolverOptions {
  /** Join orders shared with the prepares. */
  plans?: JoinPlanCache
  /** Most memory kept for the joined rest, in bytes; above it every solve is full. @default 64 MiB */
  maxKeptBytes?: number
}

/**
 * Solves a document again after an edit, redoing only what the edit touches. When exactly one
 * block's evaluated parameters changed (a slider drag, a typed value, a variable only it uses),
 * the network is compiled once with that block joined last; the S of everything else is kept per
 * frequency, and further edits of the same block refill it alone and replay its joins. Anything
 * else (another block, several blocks, wires, ports, settings, the sweep) falls back to a full
 * solve. S agrees with `solveNetwork` to rounding (only the join order differs).
 *
 * Sub-network documents and data sets are not part of the comparison: call `reset` when they change.
 */
export class EditSolver {
  private snapshot: EditSnapshot | undefined
  private kept: Kept | undefined
  private readonly maxKeptBytes: number

  constructor(private readonly options: EditSolverOptions = {}) {
    this.maxKeptBytes = options.maxKeptBytes ?? 64 * 1024 * 1024
  }

  /** Forgets everything kept: the next solve is full. */
  reset(): void {
    this.snapshot = undefined
    this.kept = undefined
  }

  /** Solves a prepared document (with the values its prepare evaluated) at these frequencies; output arrays are new. */
  solve(network: PreparedNetwork, evaluated: Evaluated, frequencies: Float64Array): SolveOutcome & { mode: EditSolveMode } {
    const snapshot = snapshotOf(network.document, evaluated)
    const previous = this.snapshot
    this.snapshot = snapshot
    const changed = previous && previous.structure === snapshot.structure ? changedBlocks(previous.blocks, snapshot.blocks) : undefined
    const id = changed?.length === 1 ? changed[0] : changed?.length === 0 ? this.kept?.block : undefined
    const block = id === undefined ? undefined : network.compiled.blocks.find(b => b.id === id)
    if (!block || block.instance.port) {
      this.kept = undefined
      return this.full(network, frequencies)
    }
    let mode: EditSolveMode = 'incremental'
    if (!this.kept || this.kept.block !== block.id || !fits(this.kept, block.instance)) {
      const compiled = new CompiledNetwork([...network.compiled.blocks], network.compiled.wires, { lastBlock: block.id, plans: this.options.plans })
      const chunks = Math.ceil(frequencies.length / compiled.chunkSize)
      if (compiled.keptNumbersPerChunk * 16 * chunks > this.maxKeptBytes) {
        this.kept = undefined
        return this.full(network, frequencies)
      }
      const { terminals, reciprocal } = block.instance
      this.kept = { block: block.id, compiled, terminals, reciprocal }
      mode = 'joined-last'
    }
    const size = frequencies.length * network.ports * network.ports
    const re = new Float64Array(size), im = new Float64Array(size)
    if (!this.kept.compiled.solveKeeping(frequencies, re, im, block.instance)) {
      // Singular frequencies and blocks that cannot be evaluated are handled and reported by the full solve.
      return this.full(network, frequencies)
    }
    const result = { ports: network.ports, impedances: [...network.impedances], frequencies, re, im }
    return { ok: true, result, warnings: notesFor(network, frequencies), mode }
  }

  private full(network: PreparedNetwork, frequencies: Float64Array): SolveOutcome & { mode: EditSolveMode } {
    return { ...solveNetwork(network, frequencies), mode: 'full' }
  }
}

/** Whether a block's new instance joins like the kept one: same terminals and symmetry (references may change). */
function fits(kept: Kept, instance: BlockInstance): boolean {
  return instance.terminals === kept.terminals && instance.reciprocal === kept.reciprocal
}

function snapshotOf(document: NetworkDocument, evaluated: Evaluated): EditSnapshot {
  const blocks = new Map<string, string>()
  const shape: unknown[] = []
  for (const block of document.blocks) {
    const values = JSON.stringify(evaluated.blocks[block.id] ?? null)
    // A port's index and impedance decide which joins exist, so ports belong to the structure.
    if (block.type === 'port') shape.push([block.id, block.type, values])
    else {
      shape.push([block.id, block.type])
      blocks.set(block.id, values)
    }
  }
  return { structure: JSON.stringify([shape, document.wires, document.substrates ?? null, evaluated.settings]), blocks }
}

/** Ids of the blocks whose evaluated parameters differ. */
function changedBlocks(before: Map<string, string>, after: Map<string, string>): string[] {
  const changed: string[] = []
  for (const [id, values] of after) if (before.get(id) !== values) changed.push(id)
  return changed
}
