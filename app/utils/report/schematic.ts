/**
 * The network's canvas as a picture to print: each block where the editor placed it (with its
 * turned footprint and terminals) and each wire between two terminal points, within one bounding box.
 */
import type { NetworkDocument } from '~~/shared/network/types'
import { documentNodes, type BlockNodeData } from '~~/app/utils/editor/flowModel'
import { parseTerminal } from '~~/app/utils/editor/documentOps'
import type { Side } from '~~/app/utils/editor/blockCatalog'

/** A placed block: top-left corner (px) and the canvas node's data (size, orientation, terminals). */
export interface SchematicBlock {
  x: number
  y: number
  /** The editor's symbol kind, or 'generic' for kinds it draws as a plain box. */
  kind: string
  data: BlockNodeData
}

/** A terminal's place on the page and the way its lead faces. */
export interface SchematicEnd {
  x: number
  y: number
  side: Side
}

/** Blocks, wires (between terminal points) and the box holding them all, with a margin for labels. */
export interface Schematic {
  blocks: SchematicBlock[]
  wires: Array<[SchematicEnd, SchematicEnd]>
  box: { x: number, y: number, width: number, height: number }
}

/** Room around the drawing for labels beside symbols and wire leads. */
const MARGIN = 48

/** Lays out a document's canvas for printing; wires naming a missing block or terminal are left out. */
export function schematic(doc: NetworkDocument): Schematic {
  const nodes = documentNodes(doc, { selected: new Set(), problems: {}, readOnly: true })
  const blocks = nodes.map(n => ({ x: n.position.x, y: n.position.y, kind: n.type, data: n.data }))
  const byId = new Map(blocks.map(b => [b.data.block.id, b]))
  const end = (ref: string): SchematicEnd | null => {
    const t = parseTerminal(ref)
    const b = t && byId.get(t.block)
    const term = b?.data.terminals.find(x => x.n === t!.n)
    return b && term ? { x: b.x + term.x, y: b.y + term.y, side: term.side } : null
  }
  const wires: Array<[SchematicEnd, SchematicEnd]> = []
  for (const w of doc.wires) {
    const a = end(w[0]), c = end(w[1])
    if (a && c) wires.push([a, c])
  }
  if (!blocks.length) return { blocks, wires, box: { x: 0, y: 0, width: 200, height: 100 } }
  const left = Math.min(...blocks.map(b => b.x)) - MARGIN
  const top = Math.min(...blocks.map(b => b.y)) - MARGIN
  const right = Math.max(...blocks.map(b => b.x + b.data.width)) + MARGIN
  const bottom = Math.max(...blocks.map(b => b.y + b.data.height)) + MARGIN
  return { blocks, wires, box: { x: left, y: top, width: right - left, height: bottom - top } }
}
