/** Which built-in hybrid, if any, a four-port network is: then its half circuits come in closed form. */
import type { Evaluated, NetworkDocument } from '~~/shared/network/types'
import { branchLineHalfCircuits, ringHalfCircuits, type HybridHalfCircuits, type MirrorPairs } from '~~/shared/evenodd/index'

export interface HybridModelSource {
  blockId: string
  kind: 'branch' | 'ring'
  /** Half circuits at a frequency, with the mirror pairs already in the network's port numbers. */
  at: (frequency: number) => HybridHalfCircuits
  pairs: MirrorPairs
}

const EQUAL_SPLIT_DB = 10 * Math.log10(2)

/** Port index wired straight to terminal `terminal` of block `id`, or null. */
function portOn(doc: NetworkDocument, id: string, terminal: number): number | null {
  const end = `${id}.${terminal}`
  for (const [a, b] of doc.wires) {
    const other = a === end ? b : b === end ? a : null
    if (!other) continue
    const block = doc.blocks.find(x => `${x.id}.1` === other && x.type === 'port')
    const index = Number(block?.params.index)
    if (Number.isInteger(index)) return index
  }
  return null
}

/**
 * The one `hybrid90` (branch model) or `hybrid180` (ring model) block of a network whose four
 * terminals go straight to its four ports, with its evaluated values; null for anything else.
 */
export function hybridModelSource(doc: NetworkDocument, evaluated: Evaluated | null): HybridModelSource | null {
  const hybrids = doc.blocks.filter(b => (b.type === 'hybrid90' && b.params.model === 'branch') || (b.type === 'hybrid180' && b.params.model === 'ring'))
  const others = doc.blocks.filter(b => b.type !== 'port')
  if (hybrids.length !== 1 || others.length !== 1 || !evaluated) return null
  const block = hybrids[0]!
  const ports = [1, 2, 3, 4].map(t => portOn(doc, block.id, t))
  if (ports.some(p => p === null) || new Set(ports).size !== 4) return null
  const values = evaluated.blocks[block.id] ?? {}
  const z = values.impedance?.value ?? evaluated.settings.referenceImpedance?.value
  const f0 = values.at?.value
  if (!(z! > 0) || !(f0! > 0)) return null
  const toPorts = (pairs: MirrorPairs): MirrorPairs => pairs.map(([a, b]) => [ports[a - 1]!, ports[b - 1]!]) as MirrorPairs
  if (block.type === 'hybrid90') {
    const coupling = values.couplingDb?.value ?? EQUAL_SPLIT_DB
    const at = (f: number) => { const h = branchLineHalfCircuits(z!, coupling, f0!, f); return { ...h, pairs: toPorts(h.pairs) } }
    return { blockId: block.id, kind: 'branch', at, pairs: toPorts([[1, 4], [2, 3]]) }
  }
  const at = (f: number) => { const h = ringHalfCircuits(z!, f0!, f); return { ...h, pairs: toPorts(h.pairs) } }
  return { blockId: block.id, kind: 'ring', at, pairs: toPorts([[1, 3], [2, 4]]) }
}
