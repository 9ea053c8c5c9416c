/**
 * The two wave-based joining steps of sub-network growth, batched over a run of
 * frequencies. A network of n ports is held as separate real and imaginary
 * Float64Arrays with entry (i, j) at frequency q at index (i·n + j)·stride + q, so the
 * innermost loops run over contiguous frequencies. With `symmetric` (S = Sᵀ) only the upper
 * triangle (i ≤ j) is read and written, which halves the work. Neither kernel allocates.
 */

/** Index of entry (i, j) of an n-port: from the upper triangle when only that one is kept. */
function entry(i: number, j: number, n: number, symmetric: boolean): number {
  return symmetric && i > j ? j * n + i : i * n + j
}

/** |Δ|² below this means the join has no unique solution: a resonance cut off from every port. */
export const SINGULAR_THRESHOLD_SQUARED = 1e-20

/** Scratch space the kernels need: 16 rows of `stride` numbers. */
export function kernelScratch(stride: number): Float64Array {
  return new Float64Array(16 * stride)
}

/**
 * Joins port k of network A (m ports) to port l of network B (n ports) at `count`
 * frequencies. The result has A's other ports in order, then B's (size m + n − 2):
 * out_ij = A_ij + A_ik B_ll A_kj/Δ, A_ik B_lj/Δ, B_il A_kj/Δ, B_ij + B_il A_kk B_lj/Δ
 * with Δ = 1 − A_kk B_ll. With `symmetric` (S = Sᵀ) only one triangle is computed.
 * Returns the index of the first frequency where Δ vanishes, or −1.
 */
export function mergeNetworks(
  aRe: Float64Array, aIm: Float64Array, m: number, k: number,
  bRe: Float64Array, bIm: Float64Array, n: number, l: number,
  outRe: Float64Array, outIm: Float64Array, symmetric: boolean,
  count: number, stride: number, scratch: Float64Array,
): number {
  const C = stride
  const kkA = (k * m + k) * C, llB = (l * n + l) * C
  const invR = 0, invI = C, pR = 2 * C, pI = 3 * C, cR = 4 * C, cI = 5 * C
  const t = scratch
  for (let q = 0; q < count; q++) {
    const akkR = aRe[kkA + q]!, akkI = aIm[kkA + q]!, bllR = bRe[llB + q]!, bllI = bIm[llB + q]!
    const dR = 1 - (akkR * bllR - akkI * bllI)
    const dI = -(akkR * bllI + akkI * bllR)
    const dd = dR * dR + dI * dI
    if (!(dd > SINGULAR_THRESHOLD_SQUARED)) return q
    t[invR + q] = dR / dd
    t[invI + q] = -dI / dd
  }
  const size = m + n - 2
  const rowK = k * m
  for (let i = 0; i < m; i++) {
    if (i === k) continue
    const oi = i < k ? i : i - 1
    const ik = entry(i, k, m, symmetric) * C
    for (let q = 0; q < count; q++) {
      const xR = aRe[ik + q]!, xI = aIm[ik + q]!, iR = t[invR + q]!, iI = t[invI + q]!
      const yR = xR * iR - xI * iI, yI = xR * iI + xI * iR
      const bR = bRe[llB + q]!, bI = bIm[llB + q]!
      t[pR + q] = yR; t[pI + q] = yI
      t[cR + q] = yR * bR - yI * bI; t[cI + q] = yR * bI + yI * bR
    }
    for (let j = symmetric ? i : 0; j < m; j++) {
      if (j === k) continue
      const oj = j < k ? j : j - 1
      const src = (i * m + j) * C, kj = entry(k, j, m, symmetric) * C
      const dst = (oi * size + oj) * C
      for (let q = 0; q < count; q++) {
        const uR = t[cR + q]!, uI = t[cI + q]!, wR = aRe[kj + q]!, wI = aIm[kj + q]!
        const vR = aRe[src + q]! + uR * wR - uI * wI
        const vI = aIm[src + q]! + uR * wI + uI * wR
        outRe[dst + q] = vR; outIm[dst + q] = vI
      }
    }
    for (let j = 0; j < n; j++) {
      if (j === l) continue
      const oj = m - 1 + (j < l ? j : j - 1)
      const lj = entry(l, j, n, symmetric) * C
      const dst = (oi * size + oj) * C
      for (let q = 0; q < count; q++) {
        const uR = t[pR + q]!, uI = t[pI + q]!, wR = bRe[lj + q]!, wI = bIm[lj + q]!
        const vR = uR * wR - uI * wI, vI = uR * wI + uI * wR
        outRe[dst + q] = vR; outIm[dst + q] = vI
      }
    }
  }
  for (let i = 0; i < n; i++) {
    if (i === l) continue
    const oi = m - 1 + (i < l ? i : i - 1)
    const il = entry(i, l, n, symmetric) * C
    for (let q = 0; q < count; q++) {
      const xR = bRe[il + q]!, xI = bIm[il + q]!, iR = t[invR + q]!, iI = t[invI + q]!
      const yR = xR * iR - xI * iI, yI = xR * iI + xI * iR
      const aR = aRe[kkA + q]!, aI = aIm[kkA + q]!
      t[pR + q] = yR; t[pI + q] = yI
      t[cR + q] = yR * aR - yI * aI; t[cI + q] = yR * aI + yI * aR
    }
    if (!symmetric) {
      for (let j = 0; j < m; j++) {
        if (j === k) continue
        const oj = j < k ? j : j - 1
        const kj = (rowK + j) * C, dst = (oi * size + oj) * C
        for (let q = 0; q < count; q++) {
          const uR = t[pR + q]!, uI = t[pI + q]!, wR = aRe[kj + q]!, wI = aIm[kj + q]!
          outRe[dst + q] = uR * wR - uI * wI
          outIm[dst + q] = uR * wI + uI * wR
        }
      }
    }
    for (let j = symmetric ? i : 0; j < n; j++) {
      if (j === l) continue
      const oj = m - 1 + (j < l ? j : j - 1)
      const src = (i * n + j) * C, lj = entry(l, j, n, symmetric) * C
      const dst = (oi * size + oj) * C
      for (let q = 0; q < count; q++) {
        const uR = t[cR + q]!, uI = t[cI + q]!, wR = bRe[lj + q]!, wI = bIm[lj + q]!
        const vR = bRe[src + q]! + uR * wR - uI * wI
        const vI = bIm[src + q]! + uR * wI + uI * wR
        outRe[dst + q] = vR; outIm[dst + q] = vI
      }
    }
  }
  return -1
}

/**
 * Joins ports k and l of one network S (n ports) to each other at `count` frequencies;
 * the result keeps the other ports in order (size n − 2). Sub-network growth formula,
 * written S'_ij = S_ij + u_i S_kj + v_i S_lj with u_i = (S_ik S_ll + S_il (1 − S_lk))/Δ,
 * v_i = (S_ik (1 − S_kl) + S_il S_kk)/Δ and Δ = (1 − S_kl)(1 − S_lk) − S_kk S_ll.
 * Returns the index of the first frequency where Δ vanishes, or −1.
 */
export function closeLoop(
  sRe: Float64Array, sIm: Float64Array, n: number, k: number, l: number,
  outRe: Float64Array, outIm: Float64Array, symmetric: boolean,
  count: number, stride: number, scratch: Float64Array,
): number {
  const C = stride
  const kk = (k * n + k) * C, ll = (l * n + l) * C, kl = entry(k, l, n, symmetric) * C, lk = entry(l, k, n, symmetric) * C
  const invR = 0, invI = C, uR0 = 2 * C, uI0 = 3 * C, vR0 = 4 * C, vI0 = 5 * C
  // Per-frequency constants of the join: 1 − S_kl, 1 − S_lk, S_kk, S_ll.
  const ekR0 = 6 * C, ekI0 = 7 * C, elR0 = 8 * C, elI0 = 9 * C, kkR0 = 10 * C, kkI0 = 11 * C, llR0 = 12 * C, llI0 = 13 * C
  const t = scratch
  for (let q = 0; q < count; q++) {
    const ekR = 1 - sRe[kl + q]!, ekI = -sIm[kl + q]!
    const elR = 1 - sRe[lk + q]!, elI = -sIm[lk + q]!
    const skkR = sRe[kk + q]!, skkI = sIm[kk + q]!, sllR = sRe[ll + q]!, sllI = sIm[ll + q]!
    const dR = ekR * elR - ekI * elI - (skkR * sllR - skkI * sllI)
    const dI = ekR * elI + ekI * elR - (skkR * sllI + skkI * sllR)
    const dd = dR * dR + dI * dI
    if (!(dd > SINGULAR_THRESHOLD_SQUARED)) return q
    t[invR + q] = dR / dd
    t[invI + q] = -dI / dd
    t[ekR0 + q] = ekR; t[ekI0 + q] = ekI; t[elR0 + q] = elR; t[elI0 + q] = elI
    t[kkR0 + q] = skkR; t[kkI0 + q] = skkI; t[llR0 + q] = sllR; t[llI0 + q] = sllI
  }
  const size = n - 2
  for (let i = 0; i < n; i++) {
    if (i === k || i === l) continue
    const oi = i - (i > k ? 1 : 0) - (i > l ? 1 : 0)
    const ik = entry(i, k, n, symmetric) * C, il = entry(i, l, n, symmetric) * C
    for (let q = 0; q < count; q++) {
      const ekR = t[ekR0 + q]!, ekI = t[ekI0 + q]!, elR = t[elR0 + q]!, elI = t[elI0 + q]!
      const skkR = t[kkR0 + q]!, skkI = t[kkI0 + q]!, sllR = t[llR0 + q]!, sllI = t[llI0 + q]!
      const sikR = sRe[ik + q]!, sikI = sIm[ik + q]!, silR = sRe[il + q]!, silI = sIm[il + q]!
      const unR = sikR * sllR - sikI * sllI + silR * elR - silI * elI
      const unI = sikR * sllI + sikI * sllR + silR * elI + silI * elR
      const vnR = sikR * ekR - sikI * ekI + silR * skkR - silI * skkI
      const vnI = sikR * ekI + sikI * ekR + silR * skkI + silI * skkR
      const iR = t[invR + q]!, iI = t[invI + q]!
      t[uR0 + q] = unR * iR - unI * iI; t[uI0 + q] = unR * iI + unI * iR
      t[vR0 + q] = vnR * iR - vnI * iI; t[vI0 + q] = vnR * iI + vnI * iR
    }
    for (let j = symmetric ? i : 0; j < n; j++) {
      if (j === k || j === l) continue
      const oj = j - (j > k ? 1 : 0) - (j > l ? 1 : 0)
      const src = (i * n + j) * C, kj = entry(k, j, n, symmetric) * C, lj = entry(l, j, n, symmetric) * C
      const dst = (oi * size + oj) * C
      for (let q = 0; q < count; q++) {
        const uR = t[uR0 + q]!, uI = t[uI0 + q]!, vR = t[vR0 + q]!, vI = t[vI0 + q]!
        const xR = sRe[kj + q]!, xI = sIm[kj + q]!, yR = sRe[lj + q]!, yI = sIm[lj + q]!
        const rR = sRe[src + q]! + uR * xR - uI * xI + vR * yR - vI * yI
        const rI = sIm[src + q]! + uR * xI + uI * xR + vR * yI + vI * yR
        outRe[dst + q] = rR; outIm[dst + q] = rI
      }
    }
  }
  return -1
}

