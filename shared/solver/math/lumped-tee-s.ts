import { abcdToS } from './abcd-to-s'

// Reused on every call: the solver fills blocks one at a time, so a shared scratch is safe and allocates nothing per frequency.
const abcd = new Float64Array(8)
const s = new Float64Array(8)

/**
 * S of a lossless tee at angular frequency ω, referred to r at both ends: series inductance la,
 * shunt capacitance c, series inductance lb. ABCD = [[1 − ω²la·c, jω(la + lb − ω²la·lb·c)], [jωc, 1 − ω²lb·c]].
 * Writes row-major S11, S12, S21, S22 into re/im.
 */
export function lumpedTeeS(omega: number, la: number, c: number, lb: number, r: number, re: Float64Array, im: Float64Array): void {
  abcd.fill(0)
  abcd[0] = 1 - omega * omega * la * c
  abcd[3] = omega * (la + lb - omega * omega * la * lb * c)
  abcd[5] = omega * c
  abcd[6] = 1 - omega * omega * lb * c
  abcdToS(abcd, r, r, s)
  for (let e = 0; e < 4; e++) {
    re[e] = s[2 * e]!
    im[e] = s[2 * e + 1]!
  }
}
