/** A root of f between a and b, where f(a) and f(b) differ in sign, by bisection to within `tolerance`. */
export function bisectRoot(f: (x: number) => number, a: number, b: number, tolerance = 1e-10): number {
  let lo = a, hi = b
  const negativeAtLo = f(lo) < 0
  while (Math.abs(hi - lo) > tolerance) {
    const mid = (lo + hi) / 2
    if ((f(mid) < 0) === negativeAtLo) lo = mid
    else hi = mid
  }
  return (lo + hi) / 2
}
