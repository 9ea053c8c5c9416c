const PATTERN = Int8Array.of(0, 1, 2, 3, 1, 0, 3, 2, 2, 3, 0, 1, 3, 2, 1, 0)

/**
 * Writes the 4×4 S of a network with two planes of symmetry (ports 1↔2 and 1↔4 mirror):
 * S = [[a, b, c, d], [b, a, d, c], [c, d, a, b], [d, c, b, a]]; v holds a, b, c, d as re/im pairs.
 */
export function fillDoublySymmetric(v: Float64Array, re: Float64Array, im: Float64Array): void {
  const pattern = PATTERN
  for (let i = 0; i < 16; i++) {
    const p = pattern[i]!
    re[i] = v[2 * p]!
    im[i] = v[2 * p + 1]!
  }
}
