import { formatQuantity } from '../network/format-quantity'
import type { Problem } from '../network/types'
import { codeGenerationAllowed, generatedLoop, generatedMerge, generationDue, MAX_GENERATED_PORTS, type GeneratedJoin } from './generated-kernels'
import { closeLoop, kernelScratch, mergeNetworks } from './join-kernels'
import type { JoinOrder } from './join-order'
import { planJoinOrder, type JoinPlanCache } from './plan-cache'
import { blocksReachingPorts, groupNets, terminalLayout, type TerminalLayout } from './nets'
import type { BlockInstance, NestedNetwork } from './types'

/** A block ready to be joined: its id and instance. Port blocks carry `instance.port`. */
export interface CompileBlock {
  id: string
  type: string
  instance: BlockInstance
}

/** Options of the compilation: the join order (tests compare orders), its seed, and join orders remembered from earlier compilations. */
export interface CompileOptions {
  joinOrder?: JoinOrder
  seed?: number
  plans?: JoinPlanCache
  /**
   * Id of a block to join after everything else, for incremental solving: it gets a buffer of
   * its own, and what the joins before it produce can be kept (see `solveKeeping`).
   */
  lastBlock?: string
}

interface Connection {
  a: number
  b: number
  node: string
  blocks: string[]
}

interface Item {
  sockets: number[]
  buffer: number
  /** Intermediate results may hand their buffer on once joined; block and constant buffers may not. */
  pinned: boolean
  /** Its S never changes (filled once at compile time). */
  constant?: boolean
  /** Already joined into another item. */
  consumed?: boolean
}

interface DynamicBlock {
  instance: BlockInstance
  buffer: number
  id: string
  re: Float64Array
  im: Float64Array
}

const MERGE = 0
const LOOP = 1

/** One join replayed at every frequency: a loop on buffer a, or a merge of a and b over r connections. */
interface Step {
  kind: typeof MERGE | typeof LOOP
  a: number
  m: number
  k: number
  b: number
  n: number
  l: number
  out: number
  connection: number
  /** The same join as generated code, where the runtime allows it. */
  generated?: GeneratedJoin
}
/** Frequencies solved together: long enough to amortise loop overhead, short enough to stay in cache. */
export const CHUNK = 32

/**
 * A network compiled once per topology into a fixed sequence of joins over buffers
 * allocated once. Solving fills the blocks for a run of frequencies and replays the joins.
 */
export class CompiledNetwork implements NestedNetwork {
  readonly ports: number
  readonly impedances: number[]
  readonly reciprocal: boolean
  /** Number of blocks that take part in the solve (ports included). */
  readonly blockCount: number
  /** Number of join steps replayed per frequency. */
  readonly stepCount: number
  /** Whether the join order came from `plans` instead of a fresh search. */
  readonly planReused: boolean
  /** The blocks and wires it was compiled from (to compile again with another join order). */
  readonly blocks: readonly CompileBlock[]
  readonly wires: ReadonlyArray<readonly [string, string]>
  /** With `lastBlock`: the block joined last and the number of steps before its first join. */
  readonly lastBlock: string | undefined
  readonly keptSteps: number

  private readonly bufRe: Float64Array[] = []
  private readonly bufIm: Float64Array[] = []
  private readonly dynamic: DynamicBlock[] = []
  private readonly steps: Step[]
  private readonly connections: Connection[]
  private readonly gatherBuffer: Int32Array
  private readonly gatherPosition: Int32Array
  private readonly gatherSize: Int32Array
  private readonly gatherFrom: Int32Array
  private readonly scratch = kernelScratch(CHUNK)
  private readonly single = new Float64Array(1)
  private lastFailure: Problem | undefined
  /** Generated kernels may replace the generic ones once the process has done enough generic work. */
  private generationPending: boolean
  private lastFailureSingular = false
  /** The last block's fill entry, and the buffers alive before its first join with their values per chunk. */
  private readonly lastEntry: DynamicBlock | undefined
  private readonly keptBuffers: number[] = []
  /** Junctions at the last block's nets: their S follows its terminals' references, so they are refilled with it. */
  private readonly lastJunctions: DynamicBlock[] = []
  private keptRe: Float64Array[][] = []
  private keptIm: Float64Array[][] = []
  private keptFrequencies: Float64Array | undefined
  /** The kept buffers' own arrays, put back after `solveKeeping` so other solves never write over what is kept. */
  private ownRe: Float64Array[] = []
  private ownIm: Float64Array[] = []

  constructor(blocks: CompileBlock[], wires: ReadonlyArray<readonly [string, string]>, options: CompileOptions = {}) {
    this.blocks = blocks
    this.wires = wires
    const layout = terminalLayout(blocks)
    const nets = groupNets(layout, wires)
    const kept = blocksReachingPorts(blocks, layout, nets)
    const portBlocks = blocks.filter(block => block.instance.port).sort((p, q) => p.instance.port!.index - q.instance.port!.index)
    this.ports = portBlocks.length
    this.impedances = portBlocks.map(block => block.instance.port!.impedance)
    this.blockCount = blocks.filter((_, b) => kept(b)).length

    const space = new Workspace(this.bufRe, this.bufIm, layout.count)
    let reciprocal = true
    let lastSockets: Set<number> | undefined
    let lastEntry: DynamicBlock | undefined
    blocks.forEach((block, b) => {
      if (!kept(b) || block.instance.port) return
      reciprocal &&= block.instance.reciprocal
      const last = block.id === options.lastBlock
      const dynamic = space.addBlock(block, layout.base[b]!, last)
      if (last) {
        lastEntry = dynamic
        lastSockets = new Set(Array.from({ length: block.instance.terminals }, (_, t) => layout.base[b]! + t))
      }
      else if (dynamic) this.dynamic.push(dynamic)
    })
    this.reciprocal = reciprocal
    this.lastEntry = lastEntry
    this.lastBlock = lastEntry ? options.lastBlock : undefined
    const lastNets = lastEntry && lastSockets ? { sockets: lastSockets, instance: () => lastEntry!.instance, junctions: this.lastJunctions } : undefined
    this.connections = connectNets(blocks, layout, nets.filter(members => kept(layout.blockOf[members[0]!]!)), space, lastNets)
    // With a last block, the joins that do not touch it come first and are planned on their own.
    const early = this.connections.map((_, c) => c).filter(c => !lastSockets?.has(this.connections[c]!.a) && !lastSockets?.has(this.connections[c]!.b))
    const late = lastSockets ? this.connections.map((_, c) => c).filter(c => lastSockets!.has(this.connections[c]!.a) || lastSockets!.has(this.connections[c]!.b)) : []
    const plan = planJoinOrder(
      { items: space.items.map(item => item.sockets), connections: early.map(c => this.connections[c]!), socketCount: space.nextSocket, order: options.joinOrder, seed: options.seed },
      options.plans,
    )
    this.planReused = plan.reused
    this.steps = recordSteps(space, this.connections, plan.order.map(c => early[c]!))
    this.keptSteps = this.steps.length
    if (this.lastEntry) {
      // Everything alive now is kept between solves, so the joins after this point must not write over it.
      const alive = space.items.filter(item => !item.consumed && item.sockets.length > 0)
      for (const item of alive) item.pinned = true
      const refilled = new Set([this.lastEntry.buffer, ...this.lastJunctions.map(j => j.buffer)])
      this.keptBuffers = [...new Set(alive.filter(item => !item.constant && !refilled.has(item.buffer)).map(item => item.buffer))]
      this.ownRe = this.keptBuffers.map(buffer => this.bufRe[buffer]!)
      this.ownIm = this.keptBuffers.map(buffer => this.bufIm[buffer]!)
      this.forgetKept()
      // The last joins are planned on what is left, so the block meets its small junctions before the large rest.
      const lastPlan = planJoinOrder(
        { items: alive.map(item => item.sockets), connections: late.map(c => this.connections[c]!), socketCount: space.nextSocket, order: options.joinOrder, seed: options.seed },
        options.plans,
      )
      this.steps.push(...recordSteps(space, this.connections, lastPlan.order.map(c => late[c]!)))
    }
    this.generationPending = codeGenerationAllowed()
    this.stepCount = this.steps.length

    // Where each external port ends up: buffer and position of its final item.
    this.gatherBuffer = new Int32Array(this.ports).fill(-1)
    this.gatherPosition = new Int32Array(this.ports)
    this.gatherSize = new Int32Array(this.ports)
    space.externalPort.forEach((p, socket) => {
      const item = space.items[space.socketItem[socket]!]!
      this.gatherBuffer[p] = item.buffer
      this.gatherPosition[p] = item.sockets.indexOf(socket)
      this.gatherSize[p] = item.sockets.length
    })
    // Entry (i, j) of the result: where it sits in its buffer, or −1 when i and j end in different items (S = 0).
    this.gatherFrom = new Int32Array(this.ports * this.ports)
    for (let i = 0; i < this.ports; i++) {
      for (let j = 0; j < this.ports; j++) {
        const pi = this.gatherPosition[i]!, pj = this.gatherPosition[j]!, size = this.gatherSize[i]!
        // Reciprocal joins keep only the upper triangle.
        this.gatherFrom[i * this.ports + j] = this.gatherBuffer[i]! >= 0 && this.gatherBuffer[j] === this.gatherBuffer[i]
          ? (reciprocal && pi > pj ? pj * size + pi : pi * size + pj) * CHUNK
          : -1
      }
    }
  }

  /** Frequencies solved together. */
  get chunkSize(): number {
    return CHUNK
  }

  /** Numbers (real and imaginary parts) `solveKeeping` keeps per chunk of frequencies. */
  get keptNumbersPerChunk(): number {
    return this.keptBuffers.reduce((sum, buffer) => sum + 2 * this.bufRe[buffer]!.length, 0)
  }

  /** Why the last solve failed. */
  failure(): Problem | undefined {
    return this.lastFailure
  }

  /** Whether the last failure was a singular join or a non-finite result (not a block that cannot be evaluated). */
  failedAsSingular(): boolean {
    return this.lastFailureSingular
  }

  /**
   * Solves at frequency f and writes the ports×ports S, row-major, into re/im from offset.
   * Returns false (see `failure`) when a join is singular or a block cannot be evaluated.
   */
  solveAt(frequency: number, re: Float64Array, im: Float64Array, offset = 0): boolean {
    this.single[0] = frequency
    return this.solveRun(this.single, 0, 1, re, im, offset)
  }

  /**
   * Solves at every frequency and writes S(i+1)(j+1) at frequency k to index (k·ports + i)·ports + j.
   * Returns false (see `failure`) at the first frequency that cannot be solved.
   */
  solveFrequencies(frequencies: Float64Array, re: Float64Array, im: Float64Array): boolean {
    const nn = this.ports * this.ports
    for (let start = 0; start < frequencies.length; start += CHUNK) {
      const count = Math.min(CHUNK, frequencies.length - start)
      if (!this.solveRun(frequencies, start, count, re, im, start * nn)) return false
    }
    return true
  }

  /**
   * As `solveFrequencies`, for a network compiled with `lastBlock`. The first call (or one at
   * other frequencies, or after `forgetKept`) joins everything and keeps what the joins before
   * the last block produced, per frequency; later calls fill only the last block (give its
   * new instance, same terminals and references) and replay the joins that involve it.
   * Returns false (see `failure`) at the first frequency that cannot be solved.
   */
  solveKeeping(frequencies: Float64Array, re: Float64Array, im: Float64Array, lastInstance?: BlockInstance): boolean {
    const entry = this.lastEntry
    if (!entry) return this.solveFrequencies(frequencies, re, im)
    if (lastInstance) entry.instance = lastInstance
    const reuse = this.keptFrequencies !== undefined && sameNumbers(this.keptFrequencies, frequencies)
    if (!reuse) this.forgetKept()
    this.fillJunctions()
    try {
      if (!this.keepRuns(entry, frequencies, re, im, reuse)) {
        if (!reuse) this.forgetKept()
        return false
      }
    }
    finally {
      this.keptBuffers.forEach((buffer, i) => {
        this.bufRe[buffer] = this.ownRe[i]!
        this.bufIm[buffer] = this.ownIm[i]!
      })
    }
    if (!reuse) this.keptFrequencies = Float64Array.from(frequencies)
    return true
  }

  private keepRuns(entry: DynamicBlock, frequencies: Float64Array, re: Float64Array, im: Float64Array, reuse: boolean): boolean {
    const nn = this.ports * this.ports
    const { bufRe, bufIm, keptBuffers } = this
    for (let start = 0, chunk = 0; start < frequencies.length; start += CHUNK, chunk++) {
      const count = Math.min(CHUNK, frequencies.length - start)
      // Kept buffers are swapped in per chunk: the full run writes straight into them, a reuse reads them.
      for (let i = 0; i < keptBuffers.length; i++) {
        const buffer = keptBuffers[i]!
        if (!reuse) {
          this.keptRe[i]!.push(new Float64Array(bufRe[buffer]!.length))
          this.keptIm[i]!.push(new Float64Array(bufIm[buffer]!.length))
        }
        bufRe[buffer] = this.keptRe[i]![chunk]!
        bufIm[buffer] = this.keptIm[i]![chunk]!
      }
      const ok = reuse
        ? this.fillBlock(entry, frequencies, start, count) && this.replay(frequencies, start, count, this.keptSteps, re, im, start * nn)
        : this.solveRun(frequencies, start, count, re, im, start * nn)
      if (!ok) return false
    }
    return true
  }

  /** Drops what `solveKeeping` kept, so that its next call joins everything again. */
  forgetKept(): void {
    this.keptFrequencies = undefined
    this.keptRe = this.keptBuffers.map(() => [])
    this.keptIm = this.keptBuffers.map(() => [])
  }

  private solveRun(frequencies: Float64Array, start: number, count: number, re: Float64Array, im: Float64Array, offset: number): boolean {
    if (!this.fillBlocks(frequencies, start, count)) return false
    return this.replay(frequencies, start, count, 0, re, im, offset)
  }

  /** Runs the join steps from `first` on and gathers the ports' entries. */
  private replay(frequencies: Float64Array, start: number, count: number, first: number, re: Float64Array, im: Float64Array, offset: number): boolean {
    const { bufRe, bufIm, reciprocal, scratch, steps } = this
    if (this.generationPending && generationDue(count * (steps.length - first))) this.useGeneratedKernels()
    for (let s = first; s < steps.length; s++) {
      const step = steps[s]!
      const { a, b, out, generated } = step
      const failed = generated
        ? generated(bufRe[a]!, bufIm[a]!, bufRe[b]!, bufIm[b]!, bufRe[out]!, bufIm[out]!, count)
        : step.kind === LOOP
        ? closeLoop(bufRe[a]!, bufIm[a]!, step.m, step.k, step.l, bufRe[out]!, bufIm[out]!, reciprocal, count, CHUNK, scratch)
        : mergeNetworks(bufRe[a]!, bufIm[a]!, step.m, step.k, bufRe[b]!, bufIm[b]!, step.n, step.l, bufRe[out]!, bufIm[out]!, reciprocal, count, CHUNK, scratch)
      if (failed >= 0) {
        this.lastFailure = this.singular(step.connection, frequencies[start + failed]!)
        this.lastFailureSingular = true
        return false
      }
    }
    return this.gather(frequencies, start, count, re, im, offset)
  }

  /** Gives each step its generated kernel (same arithmetic, so S does not change). */
  private useGeneratedKernels(): void {
    this.generationPending = false
    for (const step of this.steps) {
      if (step.m + step.n - 2 > MAX_GENERATED_PORTS) continue
      step.generated = step.kind === LOOP
        ? generatedLoop(step.m, step.k, step.l, this.reciprocal, CHUNK)
        : generatedMerge(step.m, step.k, step.n, step.l, this.reciprocal, CHUNK)
    }
  }

  /** Writes every frequency-dependent block's S into its buffer slots for this run. */
  private fillBlocks(frequencies: Float64Array, start: number, count: number): boolean {
    for (const entry of this.dynamic) if (!this.fillBlock(entry, frequencies, start, count)) return false
    return this.fillLast(frequencies, start, count)
  }

  /** Fills the last block and the junctions at its nets, if there is a last block. */
  private fillLast(frequencies: Float64Array, start: number, count: number): boolean {
    if (!this.lastEntry) return true
    this.fillJunctions()
    return this.fillBlock(this.lastEntry, frequencies, start, count)
  }

  /** Junction S depends on references only, not frequency: filled once into every slot. Their buffers are never swapped or written by joins. */
  private fillJunctions(): void {
    for (const entry of this.lastJunctions) {
      entry.instance.fill(0, entry.re, entry.im)
      spread(entry.re, entry.im, this.bufRe[entry.buffer]!, this.bufIm[entry.buffer]!, CHUNK)
    }
  }

  /** Writes one block's S into its buffer slots for this run. */
  private fillBlock(entry: DynamicBlock, frequencies: Float64Array, start: number, count: number): boolean {
    const n2 = entry.instance.terminals * entry.instance.terminals
    const targetRe = this.bufRe[entry.buffer]!, targetIm = this.bufIm[entry.buffer]!
    for (let q = 0; q < count; q++) {
      const frequency = frequencies[start + q]!
      if (!entry.instance.fill(frequency, entry.re, entry.im)) {
        this.lastFailureSingular = false
        this.lastFailure = entry.instance.failure?.() ?? {
          block: entry.id,
          frequency,
          message: `block ${entry.id} cannot be evaluated at ${formatQuantity(frequency, 'frequency')}`,
        }
        return false
      }
      for (let e = 0; e < n2; e++) {
        targetRe[e * CHUNK + q] = entry.re[e]!
        targetIm[e * CHUNK + q] = entry.im[e]!
      }
    }
    return true
  }

  /** Copies the final items' entries into port order; refuses to hand on a non-finite number. */
  private gather(frequencies: Float64Array, start: number, count: number, re: Float64Array, im: Float64Array, offset: number): boolean {
    const { bufRe, bufIm, gatherFrom } = this
    const n = this.ports, nn = n * n
    // x·0 is 0 for every finite x and NaN otherwise, so one sum tells whether anything was not finite.
    let check = 0
    for (let e = 0; e < nn; e++) {
      const from = gatherFrom[e]!
      let at = offset + e
      if (from < 0) {
        for (let q = 0; q < count; q++, at += nn) { re[at] = 0; im[at] = 0 }
        continue
      }
      const buffer = this.gatherBuffer[Math.floor(e / n)]!
      const sourceRe = bufRe[buffer]!, sourceIm = bufIm[buffer]!
      for (let q = 0; q < count; q++, at += nn) {
        const vR = sourceRe[from + q]!, vI = sourceIm[from + q]!
        check += vR * 0 + vI * 0
        re[at] = vR
        im[at] = vI
      }
    }
    if (check === 0) return true
    // Something was not finite: name the first frequency and entry.
    for (let e = 0; e < nn; e++) {
      for (let q = 0; q < count; q++) {
        const at = offset + q * nn + e
        if (Math.abs(re[at]!) < Infinity && Math.abs(im[at]!) < Infinity) continue
        const frequency = frequencies[start + q]!
        this.lastFailureSingular = true
        this.lastFailure = { frequency, message: `the result is not a finite number at ${formatQuantity(frequency, 'frequency')} (S${Math.floor(e / n) + 1}${(e % n) + 1})` }
        return false
      }
    }
    return true
  }

  private singular(c: number, frequency: number): Problem {
    const connection = this.connections[c]!
    return {
      block: connection.blocks[0],
      frequency,
      message:
        `the network cannot be solved at ${formatQuantity(frequency, 'frequency')}: at the node ${connection.node} ` +
        `a resonance is cut off from every port, or ideal blocks are shorted onto themselves (blocks ${connection.blocks.join(', ')})`,
    }
  }
}

/**
 * The networks being grown while compiling: items (socket lists with a buffer), which item
 * holds each socket, which sockets are external ports, and the buffers themselves.
 * Blocks and constants keep their buffers; intermediate results hand theirs on once joined.
 */
class Workspace {
  readonly items: Item[] = []
  readonly socketItem: number[] = []
  readonly externalPort: number[] = []
  nextSocket: number
  private readonly constants = new Map<string, number>()
  private readonly shared = new Map<string, number>()
  private readonly free = new Map<number, number[]>()

  constructor(private readonly re: Float64Array[], private readonly im: Float64Array[], terminalCount: number) {
    this.nextSocket = terminalCount
  }

  addBuffer(size: number): number {
    this.re.push(new Float64Array(size * size * CHUNK))
    this.im.push(new Float64Array(size * size * CHUNK))
    return this.re.length - 1
  }

  addItem(sockets: number[], buffer: number, pinned: boolean): Item {
    const item = { sockets, buffer, pinned }
    this.items.push(item)
    for (const s of sockets) this.socketItem[s] = this.items.length - 1
    return item
  }

  /** An item whose S never changes; equal constants share one buffer. */
  constantItem(sockets: number[], re: Float64Array, im: Float64Array): Item {
    const key = `${sockets.length}:${re.join(',')}:${im.join(',')}`
    let buffer = this.constants.get(key)
    if (buffer === undefined) {
      buffer = this.addBuffer(sockets.length)
      this.constants.set(key, buffer)
      spread(re, im, this.re[buffer]!, this.im[buffer]!, CHUNK)
    }
    const item = this.addItem(sockets, buffer, true)
    item.constant = true
    return item
  }

  /**
   * Adds a block's item; returns what must be filled per frequency, if anything. An `own`
   * block (one to be refilled alone later) always gets a buffer of its own and is filled.
   */
  addBlock(block: CompileBlock, base: number, own = false): DynamicBlock | undefined {
    const { instance } = block
    const n = instance.terminals
    const sockets = Array.from({ length: n }, (_, t) => base + t)
    const re = new Float64Array(n * n), im = new Float64Array(n * n)
    if (own) {
      const buffer = this.addBuffer(n)
      this.addItem(sockets, buffer, true)
      return { instance, buffer, id: block.id, re, im }
    }
    if (instance.constant) {
      instance.fill(0, re, im)
      this.constantItem(sockets, re, im)
      return undefined
    }
    const key = instance.shareKey
    const existing = key === undefined ? undefined : this.shared.get(key)
    if (existing !== undefined) {
      // Joins only read their inputs, so identical blocks can read one buffer.
      this.addItem(sockets, existing, true)
      return undefined
    }
    const buffer = this.addBuffer(n)
    if (key !== undefined) this.shared.set(key, buffer)
    this.addItem(sockets, buffer, true)
    return { instance, buffer, id: block.id, re, im }
  }

  acquire(size: number): number {
    return this.free.get(size)?.pop() ?? this.addBuffer(size)
  }

  release(item: Item): void {
    if (item.pinned) return
    const list = this.free.get(item.sockets.length)
    if (list) list.push(item.buffer)
    else this.free.set(item.sockets.length, [item.buffer])
  }
}

/**
 * Turns each net into joins: two terminals of one reference are joined directly, a port
 * alone with one terminal of its reference makes that terminal external, an open terminal
 * meets a constant Γ = 1, and anything else goes through an ideal junction.
 */
function connectNets(blocks: readonly CompileBlock[], layout: TerminalLayout, nets: readonly number[][], space: Workspace, last?: LastNets): Connection[] {
  const connections: Connection[] = []
  const instanceOf = (t: number) => blocks[layout.blockOf[t]!]!.instance
  const refOf = (t: number): number => {
    const instance = instanceOf(t)
    return instance.port ? instance.port.impedance : instance.refs[t - layout.base[layout.blockOf[t]!]!]!
  }
  for (const members of nets) {
    if (last && members.length > 1 && members.some(t => last.sockets.has(t))) {
      connectThroughJunction(members, last, refOf, instanceOf, space, (a, b) => connections.push({ a, b, node: members.map(layout.name).join(', '), blocks: [...new Set(members.map(t => blocks[layout.blockOf[t]!]!.id))] }), layout)
      continue
    }
    const elements = members.filter(t => !instanceOf(t).port)
    const portsHere = members.filter(t => instanceOf(t).port)
    const node = members.map(layout.name).join(', ')
    const nodeBlocks = [...new Set(members.map(t => blocks[layout.blockOf[t]!]!.id))]
    const connect = (a: number, b: number) => connections.push({ a, b, node, blocks: nodeBlocks })
    const sameRef = members.every(t => Math.abs(refOf(t) - refOf(members[0]!)) <= 1e-12 * refOf(members[0]!))
    if (members.length === 1) {
      // An unconnected terminal is open: Γ = 1 whatever its reference.
      const socket = space.nextSocket++
      space.constantItem([socket], Float64Array.of(1), Float64Array.of(0))
      connect(members[0]!, socket)
    } else if (portsHere.length === 0 && elements.length === 2 && sameRef) {
      connect(elements[0]!, elements[1]!)
    } else if (portsHere.length === 1 && elements.length === 1 && sameRef) {
      space.externalPort[elements[0]!] = instanceOf(portsHere[0]!).port!.index - 1
    } else {
      // Ideal junction with per-terminal references: S_ij = 2√(G_i G_j)/ΣG − δ_ij.
      const sockets = members.map(() => space.nextSocket++)
      const g = members.map(t => 1 / refOf(t))
      const total = g.reduce((sum, x) => sum + x, 0)
      const n = members.length
      const re = new Float64Array(n * n)
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) re[i * n + j] = (2 * Math.sqrt(g[i]! * g[j]!)) / total - (i === j ? 1 : 0)
      }
      space.constantItem(sockets, re, new Float64Array(n * n))
      members.forEach((t, i) => {
        const port = instanceOf(t).port
        if (port) space.externalPort[sockets[i]!] = port.index - 1
        else connect(t, sockets[i]!)
      })
    }
  }
  return connections
}

/** The last block's terminals (junction sockets at its nets are added), its current instance, and the junctions made there. */
interface LastNets {
  sockets: Set<number>
  instance: () => BlockInstance
  junctions: DynamicBlock[]
}

/**
 * Joins a net of the last block through an ideal junction filled at solve time from the
 * references then: a new value of the block may change its references, and with them whether
 * the net needs a junction at all (with equal references the junction passes waves unchanged).
 */
function connectThroughJunction(
  members: number[], last: LastNets, refOf: (t: number) => number, instanceOf: (t: number) => BlockInstance,
  space: Workspace, connect: (a: number, b: number) => void, layout: TerminalLayout,
): void {
  const n = members.length
  const sockets = members.map(() => space.nextSocket++)
  const lastBase = Math.min(...[...last.sockets].filter(t => t < layout.count))
  const refs = members.map(t => (last.sockets.has(t) ? () => last.instance().refs[t - lastBase]! : () => refOf(t)))
  const instance: BlockInstance = {
    terminals: n, refs: new Float64Array(n), reciprocal: true, constant: false,
    fill(_frequency, re, im) {
      let total = 0
      for (let i = 0; i < n; i++) total += 1 / refs[i]!()
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) re[i * n + j] = (2 * Math.sqrt(1 / refs[i]!() / refs[j]!())) / total - (i === j ? 1 : 0)
      }
      im.fill(0)
      return true
    },
  }
  const buffer = space.addBuffer(n)
  space.addItem(sockets, buffer, true)
  last.junctions.push({ instance, buffer, id: layout.name(members[0]!), re: new Float64Array(n * n), im: new Float64Array(n * n) })
  members.forEach((t, i) => {
    last.sockets.add(sockets[i]!)
    const port = instanceOf(t).port
    if (port) space.externalPort[sockets[i]!] = port.index - 1
    else connect(t, sockets[i]!)
  })
}

/** Records each join of the chosen order as a step over fixed buffers. */
function recordSteps(space: Workspace, connections: readonly Connection[], sequence: readonly number[]): Step[] {
  const { items, socketItem } = space
  const steps: Step[] = []
  for (const c of sequence) {
    const { a, b } = connections[c]!
    const x = socketItem[a]!, y = socketItem[b]!
    const ix = items[x]!, iy = items[y]!
    const k = ix.sockets.indexOf(a)
    if (x === y) {
      const l = ix.sockets.indexOf(b)
      const sockets = ix.sockets.filter((_, i) => i !== k && i !== l)
      const out = space.addItem(sockets, space.acquire(sockets.length), false)
      steps.push({ kind: LOOP, a: ix.buffer, m: ix.sockets.length, k, b: 0, n: 0, l, out: out.buffer, connection: c })
      ix.consumed = true
      space.release(ix)
    } else {
      const l = iy.sockets.indexOf(b)
      const sockets = [...ix.sockets.filter((_, i) => i !== k), ...iy.sockets.filter((_, i) => i !== l)]
      const out = space.addItem(sockets, space.acquire(sockets.length), false)
      steps.push({ kind: MERGE, a: ix.buffer, m: ix.sockets.length, k, b: iy.buffer, n: iy.sockets.length, l, out: out.buffer, connection: c })
      ix.consumed = true
      iy.consumed = true
      space.release(ix)
      space.release(iy)
    }
  }
  return steps
}

/** Copies one matrix to every frequency slot of a batched buffer. */
function spread(re: Float64Array, im: Float64Array, targetRe: Float64Array, targetIm: Float64Array, stride: number): void {
  for (let e = 0; e < re.length; e++) {
    targetRe.fill(re[e]!, e * stride, (e + 1) * stride)
    targetIm.fill(im[e]!, e * stride, (e + 1) * stride)
  }
}

/** Whether two arrays hold the same numbers. */
function sameNumbers(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false
  return true
}
