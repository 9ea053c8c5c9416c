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
    return { x: l.x, y: l.y, w: s.width * GRID, h: s.height * GRID }
  })
}

/** Nearest spot to `near`, searched outwards on a coarse grid, where a new 4×4 block overlaps nothing (labels included). */
export function freeSpot(doc: NetworkDocument, near: { x: number, y: number }): { x: number, y: number } {
  const taken = boxes(doc)
  const step = 6 * GRID
  const clear = (x: number, y: number) => taken.every(b => x + 4 * GRID + GRID <= b.x || b.x + b.w + GRID <= x || y + 5 * GRID <= b.y || b.y + b.h + 2 * GRID <= y)
  for (let ring = 0; ring < 12; ring++) {
    for (let dy = -ring; dy <= ring; dy++) {
      for (let dx = -ring; dx <= ring; dx++) {
        if (Math.max(Math.abs(dx), Math.abs(dy)) !== ring) continue
        const x = near.x + dx * step
        const y = near.y + dy * step
        if (clear(x, y)) return { x, y }
      }
    }
  }
  return near
}
