const RATIO = (Math.sqrt(5) - 1) / 2

/**
 * The x in [a, b] where a unimodal f is largest, by golden-section search to within `tolerance`
 * (Press et al., Numerical Recipes, 3rd ed., §10.2).
 */
export function goldenSectionMax(f: (x: number) => number, a: number, b: number, tolerance = 1e-9): number {
  let lo = a, hi = b
  let x1 = hi - RATIO * (hi - lo), x2 = lo + RATIO * (hi - lo)
  let f1 = f(x1), f2 = f(x2)
  while (hi - lo > tolerance) {
    if (f1 >= f2) {
      hi = x2; x2 = x1; f2 = f1
      x1 = hi - RATIO * (hi - lo); f1 = f(x1)
    } else {
      lo = x1; x1 = x2; f1 = f2
      x2 = lo + RATIO * (hi - lo); f2 = f(x2)
    }
  }
  const x = (lo + hi) / 2
  // The ends may beat the interior when the maximum sits on them.
  return [a, b, x].reduce((best, v) => (f(v) > f(best) ? v : best), x)
}
