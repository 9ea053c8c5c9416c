/** One lossless arm between a junction node and a terminal: a line of `radians` (may be negative) and impedance z. */
export interface JunctionArm {
  radians: number
  impedance: number
  /** Turns ratio n of an ideal transformer between the line and the node (impedance seen at the node ÷ n²); 1 for none. */
  turns: number
}

// Scratch per call (3 arms): the solver fills one block at a time.
const u = new Float64Array(3), mRe = new Float64Array(3), mIm = new Float64Array(3), gRe = new Float64Array(3), gIm = new Float64Array(3)

/**
 * S (3×3, row-major into re/im) of three lossless arms meeting at a node with shunt susceptance b (S),
 * each terminal referred to r (Ω). Derived by hand: with each arm's ABCD [A B; C D] from terminal to
 * node, Z = u·uᵀ/Y + diag(B/D) with u_k = 1/D_k and Y = jb + Σ C_k/D_k; then S = I − 2r(Z + r)⁻¹ by
 * Sherman–Morrison, S_kj = δ_kj(1 − 2r/m_k) + 2r·g_k·g_j/(Y + Σ u_k·g_k), m_k = r + B_k/D_k, g_k = u_k/m_k.
 * It stays finite for an ideal node (no Z-matrix): all arms of zero length and b = 0 give S = 2/3 − δ.
 */
export function threeArmJunctionS(arms: readonly JunctionArm[], b: number, r: number, re: Float64Array, im: Float64Array): void {
  let yIm = b, denRe = 0, denIm = 0
  for (let k = 0; k < 3; k++) {
    const { radians, impedance, turns } = arms[k]!
    const cos = Math.cos(radians), sin = Math.sin(radians)
    // Line then transformer: A = n·cos, B = j·Z·sin/n, C = j·n·sin/Z, D = cos/n.
    const d = cos / turns
    u[k] = 1 / d
    mRe[k] = r
    mIm[k] = (impedance * sin / turns) / d
    yIm += (turns * sin / impedance) / d
  }
  for (let k = 0; k < 3; k++) {
    const mm = mRe[k]! * mRe[k]! + mIm[k]! * mIm[k]!
    gRe[k] = (u[k]! * mRe[k]!) / mm
    gIm[k] = (-u[k]! * mIm[k]!) / mm
    denRe += u[k]! * gRe[k]!
    denIm += u[k]! * gIm[k]!
  }
  denIm += yIm
  const dd = denRe * denRe + denIm * denIm
  for (let k = 0; k < 3; k++) {
    for (let j = 0; j < 3; j++) {
      // 2r·g_k·g_j / den
      const pRe = gRe[k]! * gRe[j]! - gIm[k]! * gIm[j]!, pIm = gRe[k]! * gIm[j]! + gIm[k]! * gRe[j]!
      let sRe = (2 * r * (pRe * denRe + pIm * denIm)) / dd
      let sIm = (2 * r * (pIm * denRe - pRe * denIm)) / dd
      if (k === j) {
        const mm = mRe[k]! * mRe[k]! + mIm[k]! * mIm[k]!
        sRe += 1 - (2 * r * mRe[k]!) / mm
        sIm += (2 * r * mIm[k]!) / mm
      }
      re[3 * k + j] = sRe
      im[3 * k + j] = sIm
    }
  }
}
