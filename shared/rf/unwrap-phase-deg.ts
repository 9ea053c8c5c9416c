/**
 * Removes the 360° jumps of a wrapped phase (degrees): each step is taken as the one in
 * (−180°, 180°], which holds while the true phase moves less than 180° between samples.
 */
export function unwrapPhaseDeg(phases: Float64Array): Float64Array {
  const out = new Float64Array(phases.length)
  if (phases.length === 0) return out
  out[0] = phases[0]!
  for (let k = 1; k < phases.length; k++) {
    let step = phases[k]! - phases[k - 1]!
    step -= 360 * Math.round(step / 360)
    out[k] = out[k - 1]! + step
  }
  return out
}
