import { formatQuantity } from '../network/format-quantity'
import type { Problem } from '../network/types'
import { closeLoop, kernelScratch, mergeNetworks } from './join-kernels'
import type { JoinOrder } from './join-order'
import { chooseJoinOrder } from './join-plan'
import type { BlockInstance, NestedNetwork } from './types'

/** A block ready to be joined: its id and instance. Port blocks carry `instance.port`. */
export interface CompileBlock {
  id: string
  type: string
  instance: BlockInstance
}

/** Options of the compilation: the join order (tests compare orders) and its seed. */
export interface CompileOptions {
  joinOrder?: JoinOrder
  seed?: number
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

  private readonly bufRe: Float64Array[] = []
  private readonly bufIm: Float64Array[] = []
  private readonly dynamic: DynamicBlock[] = []
  private readonly steps: Step[]
  private readonly connections: Connection[]
  private readonly gatherBuffer: Int32Array
  private readonly gatherPosition: Int32Array
  private readonly gatherSize: Int32Array
  private readonly scratch = kernelScratch(CHUNK)
  private readonly single = new Float64Array(1)
  private lastFailure: Problem | undefined

  constructor(blocks: CompileBlock[], wires: ReadonlyArray<readonly [string, string]>, options: CompileOptions = {}) {
    const base: number[] = []
    const byId = new Map<string, number>()
    let terminalCount = 0
    blocks.forEach((block, b) => {
      base.push(terminalCount)
      byId.set(block.id, b)
      terminalCount += block.instance.terminals
    })
    const blockOf = new Int32Array(terminalCount)
    blocks.forEach((block, b) => blockOf.fill(b, base[b]!, base[b]! + block.instance.terminals))
    const terminal = (text: string): number => {
      const dot = text.lastIndexOf('.')
      return base[byId.get(text.slice(0, dot))!]! + Number(text.slice(dot + 1)) - 1
    }
    const terminalName = (t: number): string => `${blocks[blockOf[t]!]!.id}.${t - base[blockOf[t]!]! + 1}`

    // Nets: terminals joined through wires.
    const parent = Int32Array.from({ length: terminalCount }, (_, i) => i)
    const find = (i: number): number => {
      while (parent[i] !== i) {
        parent[i] = parent[parent[i]!]!
        i = parent[i]!
      }
      return i
    }
    for (const [x, y] of wires) {
      const rx = find(terminal(x)), ry = find(terminal(y))
      if (rx !== ry) parent[rx] = ry
    }
    const nets = new Map<number, number[]>()
    for (let t = 0; t < terminalCount; t++) {
      const root = find(t)
      const members = nets.get(root)
      if (members) members.push(t)
      else nets.set(root, [t])
    }

    // Blocks in a part of the network that reaches no port cannot change S; they are left out.
    const blockParent = Int32Array.from({ length: blocks.length }, (_, i) => i)
    const findBlock = (i: number): number => {
      while (blockParent[i] !== i) i = blockParent[i] = blockParent[blockParent[i]!]!
      return i
    }
    for (const members of nets.values()) {
      for (const t of members) {
        const ra = findBlock(blockOf[t]!), rb = findBlock(blockOf[members[0]!]!)
        if (ra !== rb) blockParent[ra] = rb
      }
    }
    const reachesPort = new Set<number>()
    blocks.forEach((block, b) => {
      if (block.instance.port) reachesPort.add(findBlock(b))
    })
    const kept = (b: number) => reachesPort.has(findBlock(b))

    const portBlocks = blocks.filter(block => block.instance.port).sort((p, q) => p.instance.port!.index - q.instance.port!.index)
    this.ports = portBlocks.length
    this.impedances = portBlocks.map(block => block.instance.port!.impedance)
    this.blockCount = blocks.filter((_, b) => kept(b)).length

    // Buffers: one per block (shared by identical blocks), one per distinct constant,
    // and intermediate results recycled once joined.
    const items: Item[] = []
    const socketItem: number[] = []
    const externalPort: number[] = []
    const addBuffer = (size: number): number => {
      this.bufRe.push(new Float64Array(size * size * CHUNK))
      this.bufIm.push(new Float64Array(size * size * CHUNK))
      return this.bufRe.length - 1
    }
    const addItem = (sockets: number[], buffer: number, pinned: boolean): number => {
      items.push({ sockets, buffer, pinned })
      for (const s of sockets) socketItem[s] = items.length - 1
      return items.length - 1
    }
    const constants = new Map<string, number>()
    const constantItem = (sockets: number[], re: Float64Array, im: Float64Array): number => {
      const key = `${sockets.length}:${re.join(',')}:${im.join(',')}`
      let buffer = constants.get(key)
      if (buffer === undefined) {
        buffer = addBuffer(sockets.length)
        constants.set(key, buffer)
        spread(re, im, this.bufRe[buffer]!, this.bufIm[buffer]!, CHUNK)
      }
      return addItem(sockets, buffer, true)
    }

    let nextSocket = terminalCount
    let reciprocal = true
    const shared = new Map<string, number>()
    blocks.forEach((block, b) => {
      if (!kept(b) || block.instance.port) return
      const { instance } = block
      const sockets = Array.from({ length: instance.terminals }, (_, t) => base[b]! + t)
      reciprocal &&= instance.reciprocal
      const n = instance.terminals
      const re = new Float64Array(n * n), im = new Float64Array(n * n)
      if (instance.constant) {
        instance.fill(0, re, im)
        constantItem(sockets, re, im)
        return
      }
      const key = instance.shareKey
      const existing = key === undefined ? undefined : shared.get(key)
      if (existing !== undefined) {
        // Joins only read their inputs, so identical blocks can read one buffer.
        addItem(sockets, existing, true)
        return
      }
      const buffer = addBuffer(n)
      if (key !== undefined) shared.set(key, buffer)
      addItem(sockets, buffer, true)
      this.dynamic.push({ instance, buffer, id: block.id, re, im })
    })
    this.reciprocal = reciprocal

    const connections: Connection[] = []
    const connect = (a: number, b: number, node: string, nodeBlocks: string[]) => {
      connections.push({ a, b, node, blocks: nodeBlocks })
    }
    const refOf = (t: number): number => {
      const instance = blocks[blockOf[t]!]!.instance
      return instance.port ? instance.port.impedance : instance.refs[t - base[blockOf[t]!]!]!
    }
    for (const members of nets.values()) {
      if (!kept(blockOf[members[0]!]!)) continue
      const elements = members.filter(t => !blocks[blockOf[t]!]!.instance.port)
      const portsHere = members.filter(t => blocks[blockOf[t]!]!.instance.port)
      const node = members.map(terminalName).join(', ')
      const nodeBlocks = [...new Set(members.map(t => blocks[blockOf[t]!]!.id))]
      const sameRef = members.every(t => Math.abs(refOf(t) - refOf(members[0]!)) <= 1e-12 * refOf(members[0]!))
      if (members.length === 1) {
        // An unconnected terminal is open: Γ = 1 whatever its reference.
        const socket = nextSocket++
        constantItem([socket], Float64Array.of(1), Float64Array.of(0))
        connect(members[0]!, socket, node, nodeBlocks)
      } else if (portsHere.length === 0 && elements.length === 2 && sameRef) {
        connect(elements[0]!, elements[1]!, node, nodeBlocks)
      } else if (portsHere.length === 1 && elements.length === 1 && sameRef) {
        externalPort[elements[0]!] = blocks[blockOf[portsHere[0]!]!]!.instance.port!.index - 1
      } else {
        // Ideal junction with per-terminal references: S_ij = 2√(G_i G_j)/ΣG − δ_ij.
        const sockets = members.map(() => nextSocket++)
        const g = members.map(t => 1 / refOf(t))
        const total = g.reduce((sum, x) => sum + x, 0)
        const n = members.length
        const re = new Float64Array(n * n)
        for (let i = 0; i < n; i++) {
          for (let j = 0; j < n; j++) re[i * n + j] = (2 * Math.sqrt(g[i]! * g[j]!)) / total - (i === j ? 1 : 0)
        }
        constantItem(sockets, re, new Float64Array(n * n))
        members.forEach((t, i) => {
          const port = blocks[blockOf[t]!]!.instance.port
          if (port) externalPort[sockets[i]!] = port.index - 1
          else connect(t, sockets[i]!, node, nodeBlocks)
        })
      }
    }
    this.connections = connections

    // Choose the join order once per topology, then record each join as a step.
    const free = new Map<number, number[]>()
    const acquire = (size: number): number => free.get(size)?.pop() ?? addBuffer(size)
    const release = (item: Item): void => {
      if (item.pinned) return
      const size = item.sockets.length
      const list = free.get(size)
      if (list) list.push(item.buffer)
      else free.set(size, [item.buffer])
    }
    const steps: Step[] = []
    const sequence = chooseJoinOrder(items.map(item => item.sockets), connections, nextSocket, options.joinOrder, options.seed)
    for (const c of sequence) {
      const { a, b } = connections[c]!
      const x = socketItem[a]!, y = socketItem[b]!
      const ix = items[x]!, iy = items[y]!
      const k = ix.sockets.indexOf(a)
      if (x === y) {
        const l = ix.sockets.indexOf(b)
        const sockets = ix.sockets.filter((_, i) => i !== k && i !== l)
        const out = addItem(sockets, acquire(sockets.length), false)
        steps.push({ kind: LOOP, a: ix.buffer, m: ix.sockets.length, k, b: 0, n: 0, l, out: items[out]!.buffer, connection: c })
        release(ix)
      } else {
        const l = iy.sockets.indexOf(b)
        const sockets = [...ix.sockets.filter((_, i) => i !== k), ...iy.sockets.filter((_, i) => i !== l)]
        const out = addItem(sockets, acquire(sockets.length), false)
        steps.push({ kind: MERGE, a: ix.buffer, m: ix.sockets.length, k, b: iy.buffer, n: iy.sockets.length, l, out: items[out]!.buffer, connection: c })
        release(ix)
        release(iy)
      }
    }
    this.steps = steps
    this.stepCount = steps.length

    // Where each external port ends up: buffer and position of its final item.
    this.gatherBuffer = new Int32Array(this.ports).fill(-1)
    this.gatherPosition = new Int32Array(this.ports)
    this.gatherSize = new Int32Array(this.ports)
    for (let s = 0; s < socketItem.length; s++) {
      const p = externalPort[s]
      if (p === undefined) continue
      const item = items[socketItem[s]!]!
      this.gatherBuffer[p] = item.buffer
      this.gatherPosition[p] = item.sockets.indexOf(s)
      this.gatherSize[p] = item.sockets.length
    }
  }

  /** Why the last solve failed. */
  failure(): Problem | undefined {
    return this.lastFailure
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

  private solveRun(frequencies: Float64Array, start: number, count: number, re: Float64Array, im: Float64Array, offset: number): boolean {
    const { bufRe, bufIm, steps, reciprocal, scratch } = this
    for (const entry of this.dynamic) {
      const n2 = entry.instance.terminals * entry.instance.terminals
      const targetRe = bufRe[entry.buffer]!, targetIm = bufIm[entry.buffer]!
      for (let q = 0; q < count; q++) {
        const frequency = frequencies[start + q]!
        if (!entry.instance.fill(frequency, entry.re, entry.im)) {
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
    }
    for (const step of steps) {
      const { a, b, out } = step
      const failed = step.kind === LOOP
        ? closeLoop(bufRe[a]!, bufIm[a]!, step.m, step.k, step.l, bufRe[out]!, bufIm[out]!, reciprocal, count, CHUNK, scratch)
        : mergeNetworks(bufRe[a]!, bufIm[a]!, step.m, step.k, bufRe[b]!, bufIm[b]!, step.n, step.l, bufRe[out]!, bufIm[out]!, reciprocal, count, CHUNK, scratch)
      if (failed >= 0) {
        this.lastFailure = this.singular(step.connection, frequencies[start + failed]!)
        return false
      }
    }
    const n = this.ports
    for (let i = 0; i < n; i++) {
      const bi = this.gatherBuffer[i]!, pi = this.gatherPosition[i]!, size = this.gatherSize[i]!
      for (let j = 0; j < n; j++) {
        const same = this.gatherBuffer[j] === bi
        const pj = this.gatherPosition[j]!
        // Reciprocal joins keep only the upper triangle.
        const from = (reciprocal && pi > pj ? pj * size + pi : pi * size + pj) * CHUNK
        const sourceRe = bufRe[bi]!, sourceIm = bufIm[bi]!
        for (let q = 0; q < count; q++) {
          const at = offset + (q * n + i) * n + j
          const vR = same ? sourceRe[from + q]! : 0
          const vI = same ? sourceIm[from + q]! : 0
          // NaN fails every comparison; a block model pushed past its range must not leak it.
          if (!(Math.abs(vR) < Infinity && Math.abs(vI) < Infinity)) {
            const frequency = frequencies[start + q]!
            this.lastFailure = { frequency, message: `the result is not a finite number at ${formatQuantity(frequency, 'frequency')} (S${i + 1}${j + 1})` }
            return false
          }
          re[at] = vR
          im[at] = vI
        }
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

/** Copies one matrix to every frequency slot of a batched buffer. */
function spread(re: Float64Array, im: Float64Array, targetRe: Float64Array, targetIm: Float64Array, stride: number): void {
  for (let e = 0; e < re.length; e++) {
    targetRe.fill(re[e]!, e * stride, (e + 1) * stride)
    targetIm.fill(im[e]!, e * stride, (e + 1) * stride)
  }
}
