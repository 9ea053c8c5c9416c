/**
 * Reflection and transmission of a lossless symmetric-structure half circuit: a shunt stub
 * at each end of a line. Each stub admittance is given homogeneously as j·n/d (n, d real),
 * so a stub that is a short (d = 0) stays finite. Writes [Γa, Γb, T] as re/im pairs to out,
 * referred to z0 at both ends.
 */
export function halfCircuit(
  cosT: number, sinT: number, zLine: number,
  na: number, da: number, nb: number, db: number,
  z0: number, out: Float64Array,
): void {
  // ABCD of shunt(a)·line·shunt(b), multiplied through by da·db (A', D' real; B', C' imaginary).
  const a = cosT * da * db - zLine * sinT * nb * da
  const b = zLine * sinT * da * db
  const c = na * cosT * db + (sinT * da * db) / zLine + nb * (cosT * da - na * zLine * sinT)
  const d = cosT * da * db - na * zLine * sinT * db
  const denR = a + d
  const denI = b / z0 + c * z0
  const dd = denR * denR + denI * denI
  const x = b / z0 - c * z0
  // Γa = ((a − d) + jx)/Δ, Γb = ((d − a) + jx)/Δ, T = 2·da·db/Δ
  out[0] = ((a - d) * denR + x * denI) / dd
  out[1] = (x * denR - (a - d) * denI) / dd
  out[2] = ((d - a) * denR + x * denI) / dd
  out[3] = (x * denR - (d - a) * denI) / dd
  const t = 2 * da * db
  out[4] = (t * denR) / dd
  out[5] = (-t * denI) / dd
}
