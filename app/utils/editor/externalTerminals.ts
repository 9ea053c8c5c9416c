import type { NetworkDocument } from '~~/shared/network/types'
import type { TerminalSpec } from './blockCatalog'

/** Block types whose terminals come from outside the document: a project file or another network. */
export const EXTERNAL_TYPES = ['data', 'subnetwork'] as const
export type ExternalType = (typeof EXTERNAL_TYPES)[number]

/** What the editor knows of a data file's or an inner network's ports. */
export interface ExternalPorts {
  count: number
  /** Shown beside each terminal; the port number when absent. */
  names?: string[]
}

/** Footprint and terminals of a block with `count` ports: the first half down the left side, the rest down the right. */
export function externalShape(ports: ExternalPorts): { width: number, height: number, terminals: TerminalSpec[] } {
  const count = Math.max(1, ports.count)
  const left = Math.ceil(count / 2)
  const width = 4
  const height = Math.max(2, 2 * left)
  const terminals: TerminalSpec[] = Array.from({ length: count }, (_, i) => {
    const onLeft = i < left
    const row = onLeft ? i : i - left
    return { n: i + 1, name: ports.names?.[i] ?? String(i + 1), x: onLeft ? 0 : width, y: 1 + 2 * row, side: onLeft ? 'left' : 'right' }
  })
  return { width, height, terminals }
}

/** The ports of a network document in index order, named after their port blocks. */
export function innerPorts(document: NetworkDocument): ExternalPorts {
  const ports = (document.blocks ?? [])
    .filter(b => b.type === 'port')
    .map(b => ({ id: b.id, index: Number((b.params as Record<string, unknown>).index) }))
    .sort((a, b) => a.index - b.index)
  return { count: ports.length, names: ports.map(p => p.id) }
}

/** The reference a data or subnetwork block makes (its file or network), or undefined for other blocks. */
export function externalRef(block: { type: string, params: Record<string, unknown> }): { type: ExternalType, ref: string } | undefined {
  if (block.type === 'data' && typeof block.params.file === 'string') return { type: 'data', ref: block.params.file }
  if (block.type === 'subnetwork' && typeof block.params.network === 'string') return { type: 'subnetwork', ref: block.params.network }
  return undefined
}

/** Names of the networks a document's subnetwork blocks use. */
export function subnetworkRefs(document: NetworkDocument): string[] {
  const refs = new Set<string>()
  for (const b of document.blocks ?? []) {
    const r = externalRef(b as { type: string, params: Record<string, unknown> })
    if (r?.type === 'subnetwork') refs.add(r.ref)
  }
  return [...refs]
}
