/**
 * ABCD of a uniform line of real characteristic impedance Zc (Ω), attenuation αl (Np) and phase βl (rad),
 * written as [re, im] pairs [A, B, C, D] into `out`: A = D = cosh γl, B = Zc·sinh γl, C = sinh γl/Zc
 * (Pozar, Microwave Engineering, 4th ed., Table 4.1 [memory]), with cosh(a + jb) = cosh a·cos b + j·sinh a·sin b
 * and sinh(a + jb) = sinh a·cos b + j·cosh a·sin b.
 */
export function lossyLineAbcd(impedance: number, nepers: number, radians: number, out: Float64Array = new Float64Array(8)): Float64Array {
  const ch = Math.cosh(nepers), sh = Math.sinh(nepers), c = Math.cos(radians), s = Math.sin(radians)
  const coshR = ch * c, coshI = sh * s
  const sinhR = sh * c, sinhI = ch * s
  out[0] = coshR; out[1] = coshI
  out[2] = impedance * sinhR; out[3] = impedance * sinhI
  out[4] = sinhR / impedance; out[5] = sinhI / impedance
  out[6] = coshR; out[7] = coshI
  return out
}
