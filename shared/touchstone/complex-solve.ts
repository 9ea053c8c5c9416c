/**
 * Solves A·X = B in place for complex n×n A and n×m B (row-major re/im arrays), by Gaussian
 * elimination with partial pivoting. A is destroyed; B becomes X. Returns false when A is singular
 * (a pivot smaller than `tiny` times the largest entry of A).
 */
export function solveComplexInPlace(
  n: number, m: number,
  aRe: Float64Array, aIm: Float64Array,
  bRe: Float64Array, bIm: Float64Array,
  tiny = 1e-14,
): boolean {
  let scale = 0
  for (let i = 0; i < n * n; i++) scale = Math.max(scale, Math.hypot(aRe[i]!, aIm[i]!))
  if (!(scale > 0) || !Number.isFinite(scale)) return false
  for (let col = 0; col < n; col++) {
    let pivot = col
    let best = -1
    for (let r = col; r < n; r++) {
      const size = Math.hypot(aRe[r * n + col]!, aIm[r * n + col]!)
      if (size > best) { best = size; pivot = r }
    }
    if (!(best > tiny * scale)) return false
    if (pivot !== col) {
      swapRows(aRe, aIm, n, pivot, col)
      swapRows(bRe, bIm, m, pivot, col)
    }
    const pR = aRe[col * n + col]!, pI = aIm[col * n + col]!
    const pp = pR * pR + pI * pI
    for (let r = col + 1; r < n; r++) {
      const xR = aRe[r * n + col]!, xI = aIm[r * n + col]!
      if (xR === 0 && xI === 0) continue
      // factor = A[r][col] / pivot
      const fR = (xR * pR + xI * pI) / pp, fI = (xI * pR - xR * pI) / pp
      for (let c = col; c < n; c++) subtractScaled(aRe, aIm, r * n + c, col * n + c, fR, fI)
      for (let c = 0; c < m; c++) subtractScaled(bRe, bIm, r * m + c, col * m + c, fR, fI)
    }
  }
  for (let row = n - 1; row >= 0; row--) {
    const pR = aRe[row * n + row]!, pI = aIm[row * n + row]!
    const pp = pR * pR + pI * pI
    for (let c = 0; c < m; c++) {
      let sR = bRe[row * m + c]!, sI = bIm[row * m + c]!
      for (let k = row + 1; k < n; k++) {
        const aR = aRe[row * n + k]!, aI = aIm[row * n + k]!
        const xR = bRe[k * m + c]!, xI = bIm[k * m + c]!
        sR -= aR * xR - aI * xI
        sI -= aR * xI + aI * xR
      }
      bRe[row * m + c] = (sR * pR + sI * pI) / pp
      bIm[row * m + c] = (sI * pR - sR * pI) / pp
    }
  }
  return true
}

function swapRows(re: Float64Array, im: Float64Array, width: number, a: number, b: number): void {
  for (let c = 0; c < width; c++) {
    const ar = re[a * width + c]!, ai = im[a * width + c]!
    re[a * width + c] = re[b * width + c]!
    im[a * width + c] = im[b * width + c]!
    re[b * width + c] = ar
    im[b * width + c] = ai
  }
}

function subtractScaled(re: Float64Array, im: Float64Array, target: number, source: number, fR: number, fI: number): void {
  const sR = re[source]!, sI = im[source]!
  re[target] = re[target]! - (fR * sR - fI * sI)
  im[target] = im[target]! - (fR * sI + fI * sR)
}
