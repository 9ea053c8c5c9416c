/**
 * Folds any real number into [0, 1] as a triangle wave (…, 1.2 → 0.8, −0.1 → 0.1, …), so an unconstrained
 * optimiser can move freely while every value it tries stays inside its range, with no flat clamped region.
 */
export function foldUnit(y: number): number {
  const t = ((y % 2) + 2) % 2
  return t <= 1 ? t : 2 - t
}
