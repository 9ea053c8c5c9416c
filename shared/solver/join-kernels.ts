/**
 * The two wave-based joining steps of sub-network growth, on row-major n×n
 * matrices held as separate real and imaginary Float64Arrays. Neither allocates.
 */

/** |Δ|² below this means the join has no unique solution: a resonance cut off from every port. */
export const SINGULAR_THRESHOLD_SQUARED = 1e-20

/**
 * Joins port k of network A (m ports) to port l of network B (n ports). The result has
 * A's other ports in order, then B's; it is written to out (size m + n − 2).
 * Returns false when 1 − A_kk·B_ll vanishes (the join is singular).
 */
export function mergeNetworks(
  aRe: Float64Array, aIm: Float64Array, m: number, k: number,
  bRe: Float64Array, bIm: Float64Array, n: number, l: number,
  outRe: Float64Array, outIm: Float64Array, symmetric: boolean,
): boolean {
  const akkR = aRe[k * m + k]!, akkI = aIm[k * m + k]!
  const bllR = bRe[l * n + l]!, bllI = bIm[l * n + l]!
  const dR = 1 - (akkR * bllR - akkI * bllI)
  const dI = -(akkR * bllI + akkI * bllR)
  const dd = dR * dR + dI * dI
  if (!(dd > SINGULAR_THRESHOLD_SQUARED)) return false
  const invR = dR / dd, invI = -dI / dd
  const size = m + n - 2
  // Rows that come from A: out_ij = A_ij + (A_ik B_ll / Δ) A_kj for j in A, (A_ik / Δ) B_lj for j in B.
  let oi = 0
  for (let i = 0; i < m; i++) {
    if (i === k) continue
    const aikR = aRe[i * m + k]!, aikI = aIm[i * m + k]!
    const pR = aikR * invR - aikI * invI, pI = aikR * invI + aikI * invR
    const cR = pR * bllR - pI * bllI, cI = pR * bllI + pI * bllR
    const rowOut = oi * size
    let oj = symmetric ? oi : 0
    for (let j = symmetric ? i : 0; j < m; j++) {
      if (j === k) continue
      const akjR = aRe[k * m + j]!, akjI = aIm[k * m + j]!
      const vR = aRe[i * m + j]! + cR * akjR - cI * akjI
      const vI = aIm[i * m + j]! + cR * akjI + cI * akjR
      outRe[rowOut + oj] = vR
      outIm[rowOut + oj] = vI
      if (symmetric) {
        outRe[oj * size + oi] = vR
        outIm[oj * size + oi] = vI
      }
      oj++
    }
    oj = m - 1
    for (let j = 0; j < n; j++) {
      if (j === l) continue
      const bljR = bRe[l * n + j]!, bljI = bIm[l * n + j]!
      const vR = pR * bljR - pI * bljI
      const vI = pR * bljI + pI * bljR
      outRe[rowOut + oj] = vR
      outIm[rowOut + oj] = vI
      if (symmetric) {
        outRe[oj * size + oi] = vR
        outIm[oj * size + oi] = vI
      }
      oj++
    }
    oi++
  }
  // Rows that come from B: out_ij = (B_il / Δ) A_kj for j in A, B_ij + (B_il A_kk / Δ) B_lj for j in B.
  for (let i = 0; i < n; i++) {
    if (i === l) continue
    const bilR = bRe[i * n + l]!, bilI = bIm[i * n + l]!
    const qR = bilR * invR - bilI * invI, qI = bilR * invI + bilI * invR
    const cR = qR * akkR - qI * akkI, cI = qR * akkI + qI * akkR
    const rowOut = oi * size
    if (!symmetric) {
      let oj = 0
      for (let j = 0; j < m; j++) {
        if (j === k) continue
        const akjR = aRe[k * m + j]!, akjI = aIm[k * m + j]!
        outRe[rowOut + oj] = qR * akjR - qI * akjI
        outIm[rowOut + oj] = qR * akjI + qI * akjR
        oj++
      }
    }
    let oj = symmetric ? oi : m - 1
    for (let j = symmetric ? i : 0; j < n; j++) {
      if (j === l) continue
      const bljR = bRe[l * n + j]!, bljI = bIm[l * n + j]!
      const vR = bRe[i * n + j]! + cR * bljR - cI * bljI
      const vI = bIm[i * n + j]! + cR * bljI + cI * bljR
      outRe[rowOut + oj] = vR
      outIm[rowOut + oj] = vI
      if (symmetric) {
        outRe[oj * size + oi] = vR
        outIm[oj * size + oi] = vI
      }
      oj++
    }
    oi++
  }
  return true
}

/**
 * Joins ports k and l of one network S (n ports) to each other; the result keeps the
 * other ports in order (size n − 2). Uses the sub-network growth formula, written as
 * S'_ij = S_ij + u_i S_kj + v_i S_lj. Returns false when Δ = (1 − S_kl)(1 − S_lk) − S_kk S_ll vanishes.
 */
export function closeLoop(
  sRe: Float64Array, sIm: Float64Array, n: number, k: number, l: number,
  outRe: Float64Array, outIm: Float64Array, symmetric: boolean,
): boolean {
  const kk = k * n + k, ll = l * n + l, kl = k * n + l, lk = l * n + k
  const ekR = 1 - sRe[kl]!, ekI = -sIm[kl]! // 1 − S_kl
  const elR = 1 - sRe[lk]!, elI = -sIm[lk]! // 1 − S_lk
  const skkR = sRe[kk]!, skkI = sIm[kk]!, sllR = sRe[ll]!, sllI = sIm[ll]!
  const dR = ekR * elR - ekI * elI - (skkR * sllR - skkI * sllI)
  const dI = ekR * elI + ekI * elR - (skkR * sllI + skkI * sllR)
  const dd = dR * dR + dI * dI
  if (!(dd > SINGULAR_THRESHOLD_SQUARED)) return false
  const invR = dR / dd, invI = -dI / dd
  const size = n - 2
  let oi = 0
  for (let i = 0; i < n; i++) {
    if (i === k || i === l) continue
    const sikR = sRe[i * n + k]!, sikI = sIm[i * n + k]!
    const silR = sRe[i * n + l]!, silI = sIm[i * n + l]!
    // u_i = (S_ik S_ll + S_il (1 − S_lk)) / Δ ; v_i = (S_ik (1 − S_kl) + S_il S_kk) / Δ
    const unR = sikR * sllR - sikI * sllI + silR * elR - silI * elI
    const unI = sikR * sllI + sikI * sllR + silR * elI + silI * elR
    const vnR = sikR * ekR - sikI * ekI + silR * skkR - silI * skkI
    const vnI = sikR * ekI + sikI * ekR + silR * skkI + silI * skkR
    const uR = unR * invR - unI * invI, uI = unR * invI + unI * invR
    const vR = vnR * invR - vnI * invI, vI = vnR * invI + vnI * invR
    const rowOut = oi * size
    let oj = symmetric ? oi : 0
    for (let j = symmetric ? i : 0; j < n; j++) {
      if (j === k || j === l) continue
      const skjR = sRe[k * n + j]!, skjI = sIm[k * n + j]!
      const sljR = sRe[l * n + j]!, sljI = sIm[l * n + j]!
      const xR = sRe[i * n + j]! + uR * skjR - uI * skjI + vR * sljR - vI * sljI
      const xI = sIm[i * n + j]! + uR * skjI + uI * skjR + vR * sljI + vI * sljR
      outRe[rowOut + oj] = xR
      outIm[rowOut + oj] = xI
      if (symmetric) {
        outRe[oj * size + oi] = xR
        outIm[oj * size + oi] = xI
      }
      oj++
    }
    oi++
  }
  return true
}
