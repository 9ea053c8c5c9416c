/** Evenly spaced tick values on a 1-2-5 step, about `count` of them, from `min` to `max`. */
export function linearTicks(min: number, max: number, count = 6): { values: number[], step: number } {
  if (!(Number.isFinite(min) && Number.isFinite(max)) || !(max > min)) return { values: Number.isFinite(min) ? [min] : [], step: 0 }
  const raw = (max - min) / count
  const p = 10 ** Math.floor(Math.log10(raw))
  const step = [1, 2, 2.5, 5, 10].map(m => m * p).find(s => s >= raw) ?? 10 * p
  const values: number[] = []
  const eps = step * 1e-9
  for (let v = Math.ceil((min - eps) / step) * step; v <= max + eps; v += step) values.push(Number(v.toPrecision(12)))
  return { values, step }
}
