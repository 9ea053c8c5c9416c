import type { Side, TerminalSpec } from './blockCatalog'

export type Rotation = 0 | 90 | 180 | 270

/** How a symbol sits on the canvas: turned clockwise in 90° steps after an optional left-right mirror. */
export interface Orientation {
  rotation: Rotation
  flip: boolean
}

const nextSide: Record<Side, Side> = { left: 'top', top: 'right', right: 'bottom', bottom: 'left' }
const mirrorSide: Record<Side, Side> = { left: 'right', right: 'left', top: 'top', bottom: 'bottom' }

/** Footprint (grid steps) of a symbol once turned: a quarter turn swaps width and height. */
export function orientedSize(width: number, height: number, rotation: Rotation): { width: number, height: number } {
  return rotation % 180 === 0 ? { width, height } : { width: height, height: width }
}

/** Where a terminal lands, and which way it faces, after mirroring and turning its symbol. */
export function placeTerminal(t: TerminalSpec, width: number, height: number, o: Orientation): { x: number, y: number, side: Side } {
  let x = o.flip ? width - t.x : t.x
  let y = t.y
  let side = o.flip ? mirrorSide[t.side] : t.side
  let w = width
  let h = height
  for (let turned = 0; turned < o.rotation; turned += 90) {
    const nx = h - y
    y = x
    x = nx
    side = nextSide[side]
    ;[w, h] = [h, w]
  }
  return { x, y, side }
}

/** SVG transform drawing a symbol authored in its own frame into its turned footprint (pixel units). */
export function symbolTransform(width: number, height: number, o: Orientation): string {
  const parts: string[] = []
  if (o.rotation === 90) parts.push(`translate(${height} 0) rotate(90)`)
  else if (o.rotation === 180) parts.push(`translate(${width} ${height}) rotate(180)`)
  else if (o.rotation === 270) parts.push(`translate(0 ${width}) rotate(270)`)
  if (o.flip) parts.push(`translate(${width} 0) scale(-1 1)`)
  return parts.join(' ')
}

/** Next rotation a quarter turn clockwise (`dir` 1) or anticlockwise (`dir` -1). */
export function turn(rotation: Rotation, dir: 1 | -1): Rotation {
  return (((rotation + dir * 90) % 360 + 360) % 360) as Rotation
}

/** Snap a pixel coordinate to the grid. */
export function snap(value: number, grid: number): number {
  return Math.round(value / grid) * grid
}
