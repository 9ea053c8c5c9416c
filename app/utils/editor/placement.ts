import type { NetworkDocument } from '~~/shared/network/types'
import { GRID, kindSpec } from './blockCatalog'
import { layoutOf } from './documentOps'
import { orientedSize } from './geometry'

interface Box { x: number, y: number, w: number, h: number }

function boxes(doc: NetworkDocument): Box[] {
  return doc.blocks.map((b, i) => {
    const l = layoutOf(b, i)
    const spec = kindSpec(b.type)
    const s = orientedSize(spec?.width ?? 4, spec?.height ?? 4, l.rotation)
    // Labels sit below or beside a symbol and run wider than it: reserve room for them.
    return { x: l.x - 2 * GRID, y: l.y, w: Math.max(s.width, 8) * GRID + 2 * GRID, h: s.height * GRID + 2 * GRID }
  })
}

/** Nearest spot to `near`, searched outwards on a coarse grid, where a new 4×4 block overlaps nothing (labels included). */
export function freeSpot(doc: NetworkDocument, near: { x: number, y: number }): { x: number, y: number } {
  const taken = boxes(doc)
  const stepX = 10 * GRID
  const stepY = 6 * GRID
  const clear = (x: number, y: number) => taken.every(b => x + 8 * GRID <= b.x || b.x + b.w <= x - 2 * GRID || y + 6 * GRID <= b.y || b.y + b.h <= y)
  for (let ring = 0; ring < 12; ring++) {
    for (let dy = -ring; dy <= ring; dy++) {
      for (let dx = -ring; dx <= ring; dx++) {
        if (Math.max(Math.abs(dx), Math.abs(dy)) !== ring) continue
        const x = near.x + dx * stepX
        const y = near.y + dy * stepY
        if (clear(x, y)) return { x, y }
      }
    }
  }
  return near
}
