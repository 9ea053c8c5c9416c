import { solveComplexInPlace } from './complex-solve'
import type { ParameterKind } from './types'

/**
 * Converts one n×n matrix of network data to power-wave S referred to real, positive port
 * resistances `refs` (row-major re/im in, S written to outRe/outIm). Returns false when the data
 * has no S equivalent at these references (I + M′ singular, e.g. Z = −R).
 *
 * With v = V/√R, i = I·√R per port (normalised voltage and current, a = (v + i)/2, b = (v − i)/2),
 * every kind is a hybrid law o = M′·x where each port's o is v or i and x the other:
 * Z: v = z′i, Y: i = y′v, H: (v1, i2) = h′(i1, v2), G: (i1, v2) = g′(v1, i2). Substituting
 * o = a + σb, x = a − σb (σ = +1 where o is v, −1 where o is i) gives
 *   S = Σ (I + M′)⁻¹ (M′ − I),  Σ = diag(σ).
 * For Z this is S = (z′ + I)⁻¹(z′ − I) with z′ = R^-½ Z R^-½, the real-reference form of
 * Kurokawa (IEEE Trans. MTT-13, 1965); with equal references it is the textbook Z→S conversion.
 *
 * `normalised`: the values are already M′ (version 1 files write Y, Z, H, G divided or multiplied
 * by R so that they are dimensionless); otherwise they are in ohms, siemens or plain ratios.
 */
export function toScattering(
  kind: ParameterKind, n: number, re: Float64Array, im: Float64Array, refs: ArrayLike<number>, normalised: boolean,
  outRe: Float64Array, outIm: Float64Array,
): boolean {
  if (kind === 'S') {
    outRe.set(re.subarray(0, n * n))
    outIm.set(im.subarray(0, n * n))
    return true
  }
  const aRe = new Float64Array(n * n), aIm = new Float64Array(n * n)
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const at = i * n + j
      const factor = normalised ? 1 : scale(kind, i, j, refs)
      const mR = re[at]! * factor, mI = im[at]! * factor
      const one = i === j ? 1 : 0
      aRe[at] = one + mR; aIm[at] = mI
      outRe[at] = mR - one; outIm[at] = mI
    }
  }
  if (!solveComplexInPlace(n, n, aRe, aIm, outRe, outIm)) return false
  for (let i = 0; i < n; i++) {
    if (sigma(kind, i) === 1) continue
    for (let j = 0; j < n; j++) {
      outRe[i * n + j] = -outRe[i * n + j]!
      outIm[i * n + j] = -outIm[i * n + j]!
    }
  }
  for (let i = 0; i < n * n; i++) if (!Number.isFinite(outRe[i]!) || !Number.isFinite(outIm[i]!)) return false
  return true
}

/** σ of port i: +1 where the law gives the voltage, −1 where it gives the current. */
function sigma(kind: ParameterKind, i: number): 1 | -1 {
  if (kind === 'Z') return 1
  if (kind === 'Y') return -1
  if (kind === 'H') return i === 0 ? 1 : -1
  return i === 0 ? -1 : 1
}

/** Factor turning an entry in ohms/siemens/ratio into its normalised form (derived by hand from v = V/√R, i = I√R). */
function scale(kind: ParameterKind, i: number, j: number, refs: ArrayLike<number>): number {
  const ri = refs[i]!, rj = refs[j]!
  switch (kind) {
    case 'Z': return 1 / Math.sqrt(ri * rj)
    case 'Y': return Math.sqrt(ri * rj)
    // Two-ports only: h′ = [[h11/R1, h12·√(R2/R1)], [h21·√(R2/R1), h22·R2]].
    case 'H': return i === 0 && j === 0 ? 1 / ri : i === 1 && j === 1 ? ri : Math.sqrt(refs[1]! / refs[0]!)
    // g′ = [[g11·R1, g12·√(R1/R2)], [g21·√(R1/R2), g22/R2]].
    case 'G': return i === 0 && j === 0 ? ri : i === 1 && j === 1 ? 1 / ri : Math.sqrt(refs[0]! / refs[1]!)
    default: return 1
  }
}
