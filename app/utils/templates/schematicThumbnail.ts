import type { NetworkDocument } from '~~/shared/network/types'
import { GRID, kindSpec } from '../editor/blockCatalog'
import { externalShape } from '../editor/externalTerminals'
import { orientedSize, placeTerminal, type Rotation } from '../editor/geometry'
import { portsFromFileName } from '~~/shared/touchstone/read'

/** How a block is drawn in a thumbnail: a reduced form of its canvas symbol. */
export type ThumbnailShape = 'tag' | 'ribbon' | 'square' | 'ring' | 'fork' | 'box'

/** One block of a thumbnail, in canvas pixels. */
export interface ThumbnailBlock {
  id: string
  shape: ThumbnailShape
  x: number
  y: number
  width: number
  height: number
  /** Ribbons run along x when true, along y otherwise. */
  horizontal: boolean
}

/** A thumbnail of a network: blocks and wires in canvas pixels, and the box that holds them. */
export interface SchematicThumbnail {
  viewBox: string
  blocks: ThumbnailBlock[]
  /** SVG path data of each wire, drawn as an elbow between its two terminals. */
  wires: string[]
}

const SHAPES: Record<string, ThumbnailShape> = {
  port: 'tag', line: 'ribbon', stub: 'ribbon', microstrip: 'ribbon', coupled: 'ribbon',
  hybrid90: 'square', hybrid180: 'ring', divider: 'fork',
}

/**
 * A small schematic of a document from its block layouts and wires, for previews. Blocks without a
 * layout or of unknown type are left out, and so are wires that touch them.
 */
export function schematicThumbnail(document: Pick<NetworkDocument, 'blocks' | 'wires'>, padding = GRID): SchematicThumbnail {
  const blocks: ThumbnailBlock[] = []
  const terminals = new Map<string, { x: number; y: number }>()
  for (const block of document.blocks) {
    // A data block's terminals are its file's ports, counted from the `.sNp` name.
    const filePorts = block.type === 'data' && typeof block.params.file === 'string' ? portsFromFileName(block.params.file) : undefined
    const spec = kindSpec(block.type) ?? (filePorts ? externalShape({ count: filePorts }) : undefined)
    if (!spec || !block.layout) continue
    const rotation = (((block.layout.rotation ?? 0) % 360 + 360) % 360) as Rotation
    const orientation = { rotation, flip: block.layout.flip ?? false }
    const size = orientedSize(spec.width, spec.height, rotation)
    const { x, y } = block.layout
    blocks.push({ id: block.id, shape: SHAPES[block.type] ?? 'box', x, y, width: size.width * GRID, height: size.height * GRID, horizontal: rotation % 180 === 0 })
    for (const t of spec.terminals) {
      const placed = placeTerminal(t, spec.width, spec.height, orientation)
      terminals.set(`${block.id}.${t.n}`, { x: x + placed.x * GRID, y: y + placed.y * GRID })
    }
  }
  const wires: string[] = []
  for (const [from, to] of document.wires) {
    const a = terminals.get(from), b = terminals.get(to)
    if (!a || !b) continue
    const mid = (a.x + b.x) / 2
    wires.push(`M${a.x} ${a.y}H${mid}V${b.y}H${b.x}`)
  }
  if (blocks.length === 0) return { viewBox: `0 0 ${2 * padding} ${2 * padding}`, blocks, wires }
  const left = Math.min(...blocks.map(b => b.x)) - padding
  const top = Math.min(...blocks.map(b => b.y)) - padding
  const right = Math.max(...blocks.map(b => b.x + b.width)) + padding
  const bottom = Math.max(...blocks.map(b => b.y + b.height)) + padding
  return { viewBox: `${left} ${top} ${right - left} ${bottom - top}`, blocks, wires }
}
