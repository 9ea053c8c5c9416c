import { describe, expect, it } from 'vitest'
import { orientedSize, placeTerminal, symbolTransform, turn, type Rotation } from '../../../app/utils/editor/geometry'
import { blockCatalog } from '../../../app/utils/editor/blockCatalog'

/** Apply an SVG transform string of translate/rotate/scale to a point, as the browser would. */
function applyTransform(transform: string, x: number, y: number): [number, number] {
  const ops = [...transform.matchAll(/(translate|rotate|scale)\(([^)]*)\)/g)].map(m => [m[1], m[2]!.split(/\s+/).map(Number)] as const)
  let p: [number, number] = [x, y]
  for (const [op, args] of ops.reverse()) {
    if (op === 'translate') p = [p[0] + args[0]!, p[1] + (args[1] ?? 0)]
    else if (op === 'scale') p = [p[0] * args[0]!, p[1] * (args[1] ?? args[0]!)]
    else {
      const a = (args[0]! * Math.PI) / 180
      p = [p[0] * Math.cos(a) - p[1] * Math.sin(a), p[0] * Math.sin(a) + p[1] * Math.cos(a)]
    }
  }
  return [Math.round(p[0] * 1e9) / 1e9 + 0, Math.round(p[1] * 1e9) / 1e9 + 0]
}

describe('block orientation', () => {
  const rotations: Rotation[] = [0, 90, 180, 270]

  it('puts every terminal where the drawn symbol puts it, for all turns and mirrors', () => {
    for (const spec of Object.values(blockCatalog)) {
      for (const rotation of rotations) {
        for (const flip of [false, true]) {
          const t = symbolTransform(spec.width, spec.height, { rotation, flip })
          for (const term of spec.terminals) {
            const placed = placeTerminal(term, spec.width, spec.height, { rotation, flip })
            expect([placed.x, placed.y]).toEqual(applyTransform(t, term.x, term.y))
          }
        }
      }
    }
  })

  it('keeps terminals on the footprint edge they face', () => {
    const hybrid = blockCatalog.hybrid90
    for (const rotation of rotations) {
      const size = orientedSize(hybrid.width, hybrid.height, rotation)
      for (const term of hybrid.terminals) {
        const p = placeTerminal(term, hybrid.width, hybrid.height, { rotation, flip: false })
        const onEdge = { left: p.x === 0, right: p.x === size.width, top: p.y === 0, bottom: p.y === size.height }
        expect(onEdge[p.side]).toBe(true)
      }
    }
  })

  it('turns a line so its input faces up after a clockwise quarter', () => {
    const line = blockCatalog.line
    expect(placeTerminal(line.terminals[0]!, 4, 2, { rotation: 90, flip: false })).toEqual({ x: 1, y: 0, side: 'top' })
    expect(placeTerminal(line.terminals[0]!, 4, 2, { rotation: 0, flip: true })).toEqual({ x: 4, y: 1, side: 'right' })
  })

  it('wraps turns in both directions', () => {
    expect(turn(270, 1)).toBe(0)
    expect(turn(0, -1)).toBe(270)
  })
})
