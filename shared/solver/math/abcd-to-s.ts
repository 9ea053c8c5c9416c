/**
 * Converts a two-port ABCD matrix to S referred to real impedances z1 (port 1) and z2 (port 2).
 * Input and output are [re, im] pairs in a Float64Array: abcd = [A, B, C, D] (8 numbers),
 * out = [S11, S12, S21, S22] (8 numbers). With z1 = z2 = Z0 this is the table form
 * S11 = (A + B/Z0 − C Z0 − D)/Δ, S21 = 2/Δ, S12 = 2(AD − BC)/Δ, S22 = (−A + B/Z0 − C Z0 + D)/Δ.
 */
export function abcdToS(abcd: Float64Array, z1: number, z2: number, out: Float64Array = new Float64Array(8)): Float64Array {
  const [aR, aI, bR, bI, cR, cI, dR, dI] = abcd as unknown as [number, number, number, number, number, number, number, number]
  // Scaled terms A z2, B, C z1 z2, D z1 give the unequal-reference form; the common factor cancels.
  const Az2R = aR * z2, Az2I = aI * z2
  const Cz12R = cR * z1 * z2, Cz12I = cI * z1 * z2
  const Dz1R = dR * z1, Dz1I = dI * z1
  const denR = Az2R + bR + Cz12R + Dz1R
  const denI = Az2I + bI + Cz12I + Dz1I
  const dd = denR * denR + denI * denI
  const div = (nR: number, nI: number, at: number) => {
    out[at] = (nR * denR + nI * denI) / dd
    out[at + 1] = (nI * denR - nR * denI) / dd
  }
  const root = 2 * Math.sqrt(z1 * z2)
  const detR = aR * dR - aI * dI - (bR * cR - bI * cI)
  const detI = aR * dI + aI * dR - (bR * cI + bI * cR)
  div(Az2R + bR - Cz12R - Dz1R, Az2I + bI - Cz12I - Dz1I, 0)
  div(root * detR, root * detI, 2)
  div(root, 0, 4)
  div(-Az2R + bR - Cz12R + Dz1R, -Az2I + bI - Cz12I + Dz1I, 6)
  return out
}
