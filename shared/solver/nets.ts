import type { CompileBlock } from './compile'

/** Where each block's terminals sit in one flat numbering, and how to name them in messages. */
export interface TerminalLayout {
  count: number
  base: number[]
  blockOf: Int32Array
  /** Flat terminal number of a checked terminal text `BLOCK.N`. */
  terminal(text: string): number
  /** `BLOCK.N` of a flat terminal number. */
  name(t: number): string
}

/** Numbers every block terminal consecutively, block by block. */
export function terminalLayout(blocks: readonly CompileBlock[]): TerminalLayout {
  const base: number[] = []
  const byId = new Map<string, number>()
  let count = 0
  blocks.forEach((block, b) => {
    base.push(count)
    byId.set(block.id, b)
    count += block.instance.terminals
  })
  const blockOf = new Int32Array(count)
  blocks.forEach((block, b) => blockOf.fill(b, base[b]!, base[b]! + block.instance.terminals))
  return {
    count,
    base,
    blockOf,
    terminal(text) {
      const dot = text.lastIndexOf('.')
      return base[byId.get(text.slice(0, dot))!]! + Number(text.slice(dot + 1)) - 1
    },
    name: t => `${blocks[blockOf[t]!]!.id}.${t - base[blockOf[t]!]! + 1}`,
  }
}

/** Disjoint sets over 0…n−1 with path halving. */
function disjointSets(n: number): { find(i: number): number; join(a: number, b: number): void } {
  const parent = Int32Array.from({ length: n }, (_, i) => i)
  const find = (i: number): number => {
    while (parent[i] !== i) {
      parent[i] = parent[parent[i]!]!
      i = parent[i]!
    }
    return i
  }
  return {
    find,
    join(a, b) {
      const ra = find(a), rb = find(b)
      if (ra !== rb) parent[ra] = rb
    },
  }
}

/** Nets: the terminals joined through wires, each net listed in terminal order. */
export function groupNets(layout: TerminalLayout, wires: ReadonlyArray<readonly [string, string]>): number[][] {
  const sets = disjointSets(layout.count)
  for (const [x, y] of wires) sets.join(layout.terminal(x), layout.terminal(y))
  const nets = new Map<number, number[]>()
  for (let t = 0; t < layout.count; t++) {
    const root = sets.find(t)
    const members = nets.get(root)
    if (members) members.push(t)
    else nets.set(root, [t])
  }
  return [...nets.values()]
}

/** Which blocks share a connected part with a port; the others cannot change S. */
export function blocksReachingPorts(blocks: readonly CompileBlock[], layout: TerminalLayout, nets: readonly number[][]): (b: number) => boolean {
  const sets = disjointSets(blocks.length)
  for (const members of nets) {
    for (const t of members) sets.join(layout.blockOf[t]!, layout.blockOf[members[0]!]!)
  }
  const withPort = new Set<number>()
  blocks.forEach((block, b) => {
    if (block.instance.port) withPort.add(sets.find(b))
  })
  return b => withPort.has(sets.find(b))
}
