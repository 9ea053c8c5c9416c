import { formatQuantity } from '../network/format-quantity'
import type { Problem } from '../network/types'
import { closeLoop, mergeNetworks } from './join-kernels'
import { JoinQueue, seededRandom, type JoinOrder } from './join-order'
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

const MERGE = 0
const LOOP = 1

/**
 * A network compiled once per topology into a fixed sequence of joins over buffers
 * allocated once; `solveAt` then fills the blocks and replays the joins at one frequency.
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
  private readonly dynamic: Array<{ instance: BlockInstance; buffer: number; id: string }> = []
  // Steps packed as [kind, a, m, k, b, n, l, out, connection] per step.
  private readonly steps: Int32Array
  private readonly connections: Connection[]
  private readonly gatherBuffer: Int32Array
  private readonly gatherPosition: Int32Array
  private readonly gatherSize: Int32Array
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

    // Items are networks being grown; each lists its sockets (terminal ids, then extra sockets).
    const items: Array<{ sockets: number[]; buffer: number }> = []
    const socketItem: number[] = []
    const socketConnection: number[] = []
    const externalPort: number[] = []
    const addBuffer = (size: number): number => {
      this.bufRe.push(new Float64Array(size * size))
      this.bufIm.push(new Float64Array(size * size))
      return this.bufRe.length - 1
    }
    const addItem = (sockets: number[]): number => {
      const buffer = addBuffer(sockets.length)
      items.push({ sockets, buffer })
      for (const s of sockets) socketItem[s] = items.length - 1
      return items.length - 1
    }
    let nextSocket = terminalCount
    let reciprocal = true
    blocks.forEach((block, b) => {
      if (!kept(b) || block.instance.port) return
      const sockets = Array.from({ length: block.instance.terminals }, (_, t) => base[b]! + t)
      const item = addItem(sockets)
      const buffer = items[item]!.buffer
      reciprocal &&= block.instance.reciprocal
      if (block.instance.constant) block.instance.fill(0, this.bufRe[buffer]!, this.bufIm[buffer]!)
      else this.dynamic.push({ instance: block.instance, buffer, id: block.id })
    })
    this.reciprocal = reciprocal

    const connections: Connection[] = []
    const connect = (a: number, b: number, node: string, nodeBlocks: string[]) => {
      socketConnection[a] = socketConnection[b] = connections.length
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
        const open = addItem([nextSocket++])
        this.bufRe[items[open]!.buffer]![0] = 1
        connect(members[0]!, items[open]!.sockets[0]!, node, nodeBlocks)
      } else if (portsHere.length === 0 && elements.length === 2 && sameRef) {
        connect(elements[0]!, elements[1]!, node, nodeBlocks)
      } else if (portsHere.length === 1 && elements.length === 1 && sameRef) {
        externalPort[elements[0]!] = blocks[blockOf[portsHere[0]!]!]!.instance.port!.index - 1
      } else {
        // Ideal junction with per-terminal references: S_ij = 2√(G_i G_j)/ΣG − δ_ij.
        const sockets = members.map(() => nextSocket++)
        const junction = addItem(sockets)
        const g = members.map(t => 1 / refOf(t))
        const total = g.reduce((sum, x) => sum + x, 0)
        const re = this.bufRe[items[junction]!.buffer]!
        const n = members.length
        for (let i = 0; i < n; i++) {
          for (let j = 0; j < n; j++) re[i * n + j] = (2 * Math.sqrt(g[i]! * g[j]!)) / total - (i === j ? 1 : 0)
        }
        members.forEach((t, i) => {
          const port = blocks[blockOf[t]!]!.instance.port
          if (port) externalPort[sockets[i]!] = port.index - 1
          else connect(t, sockets[i]!, node, nodeBlocks)
        })
      }
    }
    this.connections = connections

    // Choose the join order once, simulating item sizes; record each step.
    const steps: number[] = []
    const done = new Uint8Array(connections.length)
    const sizeAfter = (c: number): number => {
      const x = socketItem[connections[c]!.a]!, y = socketItem[connections[c]!.b]!
      const nx = items[x]!.sockets.length
      return x === y ? nx - 2 : nx + items[y]!.sockets.length - 2
    }
    const keyOf = (c: number): number => {
      const x = socketItem[connections[c]!.a]!, y = socketItem[connections[c]!.b]!
      const work = x === y ? items[x]!.sockets.length : items[x]!.sockets.length + items[y]!.sockets.length
      return sizeAfter(c) * 65536 + work
    }
    const perform = (c: number): number => {
      const { a, b } = connections[c]!
      const x = socketItem[a]!, y = socketItem[b]!
      const ix = items[x]!, iy = items[y]!
      const k = ix.sockets.indexOf(a)
      done[c] = 1
      if (x === y) {
        const l = ix.sockets.indexOf(b)
        const sockets = ix.sockets.filter((_, i) => i !== k && i !== l)
        const out = addItem(sockets)
        steps.push(LOOP, ix.buffer, ix.sockets.length, k, 0, 0, l, items[out]!.buffer, c)
        return out
      }
      const l = iy.sockets.indexOf(b)
      const sockets = [...ix.sockets.filter((_, i) => i !== k), ...iy.sockets.filter((_, i) => i !== l)]
      const out = addItem(sockets)
      steps.push(MERGE, ix.buffer, ix.sockets.length, k, iy.buffer, iy.sockets.length, l, items[out]!.buffer, c)
      return out
    }
    const order = options.joinOrder ?? 'auto'
    if (order === 'auto') {
      const queue = new JoinQueue()
      const stamp = new Float64Array(connections.length)
      connections.forEach((_, c) => {
        stamp[c] = keyOf(c)
        queue.push(stamp[c]!, c)
      })
      while (queue.size > 0) {
        const c = queue.pop()
        if (done[c]) continue
        const key = keyOf(c)
        if (key !== stamp[c]) {
          stamp[c] = key
          queue.push(key, c)
          continue
        }
        const out = perform(c)
        for (const s of items[out]!.sockets) {
          const next = socketConnection[s]
          if (next === undefined || done[next]) continue
          const fresh = keyOf(next)
          if (fresh !== stamp[next]) {
            stamp[next] = fresh
            queue.push(fresh, next)
          }
        }
      }
    } else {
      const sequence = connections.map((_, c) => c)
      if (order === 'random') {
        const random = seededRandom(options.seed ?? 1)
        for (let i = sequence.length - 1; i > 0; i--) {
          const j = Math.floor(random() * (i + 1))
          ;[sequence[i], sequence[j]] = [sequence[j]!, sequence[i]!]
        }
      }
      for (const c of sequence) perform(c)
    }
    this.steps = Int32Array.from(steps)
    this.stepCount = steps.length / 9

    // Where each external port ends up: buffer and position of its final item.
    this.gatherBuffer = new Int32Array(this.ports).fill(-1)
    this.gatherPosition = new Int32Array(this.ports)
    this.gatherSize = new Int32Array(this.ports)
    const live = new Set<number>()
    for (let s = 0; s < socketItem.length; s++) if (externalPort[s] !== undefined) live.add(socketItem[s]!)
    for (const item of live) {
      items[item]!.sockets.forEach((s, position) => {
        const p = externalPort[s]!
        this.gatherBuffer[p] = items[item]!.buffer
        this.gatherPosition[p] = position
        this.gatherSize[p] = items[item]!.sockets.length
      })
    }
  }

  /** Why the last `solveAt` failed. */
  failure(): Problem | undefined {
    return this.lastFailure
  }

  /**
   * Solves at frequency f and writes the ports×ports S, row-major, into re/im from offset.
   * Returns false (see `failure`) when a join is singular or a block cannot be evaluated.
   */
  solveAt(frequency: number, re: Float64Array, im: Float64Array, offset = 0): boolean {
    const { bufRe, bufIm, steps, reciprocal } = this
    for (const entry of this.dynamic) {
      if (!entry.instance.fill(frequency, bufRe[entry.buffer]!, bufIm[entry.buffer]!)) {
        this.lastFailure = entry.instance.failure?.() ?? {
          block: entry.id,
          frequency,
          message: `block ${entry.id} cannot be evaluated at ${formatQuantity(frequency, 'frequency')}`,
        }
        return false
      }
    }
    for (let s = 0; s < steps.length; s += 9) {
      const a = steps[s + 1]!, m = steps[s + 2]!, k = steps[s + 3]!, l = steps[s + 6]!, out = steps[s + 7]!
      const ok = steps[s] === MERGE
        ? mergeNetworks(bufRe[a]!, bufIm[a]!, m, k, bufRe[steps[s + 4]!]!, bufIm[steps[s + 4]!]!, steps[s + 5]!, l, bufRe[out]!, bufIm[out]!, reciprocal)
        : closeLoop(bufRe[a]!, bufIm[a]!, m, k, l, bufRe[out]!, bufIm[out]!, reciprocal)
      if (!ok) {
        this.lastFailure = this.singular(steps[s + 8]!, frequency)
        return false
      }
    }
    const n = this.ports
    for (let i = 0; i < n; i++) {
      const bi = this.gatherBuffer[i]!, pi = this.gatherPosition[i]!, size = this.gatherSize[i]!
      for (let j = 0; j < n; j++) {
        const at = offset + i * n + j
        if (this.gatherBuffer[j] === bi) {
          const from = pi * size + this.gatherPosition[j]!
          re[at] = bufRe[bi]![from]!
          im[at] = bufIm[bi]![from]!
        } else {
          re[at] = 0
          im[at] = 0
        }
        // NaN fails every comparison; a block model pushed past its range must not leak it.
        if (!(Math.abs(re[at]!) < Infinity && Math.abs(im[at]!) < Infinity)) {
          this.lastFailure = { frequency, message: `the result is not a finite number at ${formatQuantity(frequency, 'frequency')} (S${i + 1}${j + 1})` }
          return false
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
