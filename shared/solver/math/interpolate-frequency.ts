/**
 * Matrices sampled at increasing frequencies, read at any frequency inside the samples by linear
 * interpolation of real and imaginary parts between the two neighbouring samples (common practice
 * for measured S-parameters: exact at the samples, continuous, and no overshoot between them).
 * Returns false outside [first, last] sample.
 */
export class FrequencyInterpolator {
  private hint = 0

  constructor(
    private readonly frequencies: Float64Array,
    private readonly re: Float64Array,
    private readonly im: Float64Array,
    /** Entries per matrix (ports²). */
    private readonly size: number,
  ) {}

  /** Writes the interpolated matrix at f into outRe/outIm; false when f is outside the samples. */
  at(f: number, outRe: Float64Array, outIm: Float64Array): boolean {
    const fs = this.frequencies
    const last = fs.length - 1
    if (!(f >= fs[0]! && f <= fs[last]!)) return false
    const k = this.lowerIndex(f)
    const n = this.size
    if (k === last || fs[k] === f) {
      outRe.set(this.re.subarray(k * n, k * n + n))
      outIm.set(this.im.subarray(k * n, k * n + n))
      return true
    }
    const t = (f - fs[k]!) / (fs[k + 1]! - fs[k]!)
    const a = k * n, b = a + n
    for (let e = 0; e < n; e++) {
      outRe[e] = this.re[a + e]! + t * (this.re[b + e]! - this.re[a + e]!)
      outIm[e] = this.im[a + e]! + t * (this.im[b + e]! - this.im[a + e]!)
    }
    return true
  }

  /** Index k with fs[k] ≤ f < fs[k + 1] (or the last index); sweeps move forward, so the last answer is tried first. */
  private lowerIndex(f: number): number {
    const fs = this.frequencies
    const h = this.hint
    if (fs[h]! <= f && (h + 1 >= fs.length || f < fs[h + 1]!)) return h
    let lo = 0, hi = fs.length - 1
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1
      if (fs[mid]! <= f) lo = mid
      else hi = mid - 1
    }
    this.hint = lo
    return lo
  }
}
