import type { MatrixFormat, NumberFormat, TwoPortOrder } from './types'

/**
 * The matrix cells [row, column] in the order a file lists them for one frequency.
 * Full: row by row, except two-ports in 21_12 order (S11 S21 S12 S22, the only order of version 1).
 * Lower/Upper: the triangle row by row, each value standing for both (i, j) and (j, i).
 */
export function matrixCells(ports: number, format: MatrixFormat, twoPortOrder: TwoPortOrder): Array<[number, number]> {
  if (format === 'Full' && ports === 2 && twoPortOrder === '21_12') return [[0, 0], [1, 0], [0, 1], [1, 1]]
  const cells: Array<[number, number]> = []
  for (let i = 0; i < ports; i++) {
    const from = format === 'Upper' ? i : 0
    const to = format === 'Lower' ? i : ports - 1
    for (let j = from; j <= to; j++) cells.push([i, j])
  }
  return cells
}

const RADIANS = Math.PI / 180

/** Turns a written pair (RI, MA or DB with angle in degrees) into real and imaginary parts. */
export function pairToComplex(format: NumberFormat, a: number, b: number, out: [number, number]): void {
  if (format === 'RI') {
    out[0] = a
    out[1] = b
    return
  }
  const magnitude = format === 'MA' ? a : 10 ** (a / 20)
  out[0] = magnitude * Math.cos(b * RADIANS)
  out[1] = magnitude * Math.sin(b * RADIANS)
}
