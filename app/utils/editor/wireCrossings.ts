/**
 * Counting where wires cross: from the drawn geometry (SVG paths of straight
 * runs) or the stored routes. Pure, so the browser test and the unit tests
 * measure a layout the same way.
 */

export type Point = readonly [number, number]
export type Polyline = readonly Point[]

/** The corner points of an SVG path made of M, L, H and V commands (absolute); other commands end the reading. */
export function polylineOfPath(d: string): Point[] {
  const tokens = d.match(/[MLHV]|-?\d*\.?\d+(?:e[-+]?\d+)?/gi) ?? []
  const points: Point[] = []
  let command = ''
  let x = 0
  let y = 0
  for (let i = 0; i < tokens.length;) {
    const t = tokens[i]!
    if (/^[a-z]$/i.test(t)) { command = t; i++; continue }
    if (command === 'M' || command === 'L') { x = Number(t); y = Number(tokens[i + 1]); i += 2 }
    else if (command === 'H') { x = Number(t); i++ }
    else if (command === 'V') { y = Number(t); i++ }
    else break
    const last = points[points.length - 1]
    if (!last || last[0] !== x || last[1] !== y) points.push([x, y])
  }
  return points
}

const EPS = 1e-6

/** Whether segments a–b and c–d cross at a point inside both (touching at an end is not a crossing). */
export function segmentsCross(a: Point, b: Point, c: Point, d: Point): boolean {
  const cross = (p: Point, q: Point, r: Point) => (q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0])
  const d1 = cross(c, d, a)
  const d2 = cross(c, d, b)
  const d3 = cross(a, b, c)
  const d4 = cross(a, b, d)
  return ((d1 > EPS && d2 < -EPS) || (d1 < -EPS && d2 > EPS)) && ((d3 > EPS && d4 < -EPS) || (d3 < -EPS && d4 > EPS))
}

/** Number of points where two different wires cross (each pair of crossing runs counts once). */
export function countCrossings(wires: readonly Polyline[]): number {
  let count = 0
  for (let i = 0; i < wires.length; i++) {
    for (let j = i + 1; j < wires.length; j++) {
      const a = wires[i]!
      const b = wires[j]!
      for (let s = 0; s + 1 < a.length; s++) {
        for (let t = 0; t + 1 < b.length; t++) {
          if (segmentsCross(a[s]!, a[s + 1]!, b[t]!, b[t + 1]!)) count++
        }
      }
    }
  }
  return count
}
