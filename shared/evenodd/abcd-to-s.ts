import { add, cx, div, mul, scale, sub } from './complex'
import type { Abcd, TwoPortS } from './types'

/**
 * S of a two-port from its ABCD matrix, both ports referred to z0 (Pozar, Microwave Engineering,
 * 4th ed., Table 4.2): Δ = A + B/Z0 + C·Z0 + D, S11 = (A + B/Z0 − C·Z0 − D)/Δ, S21 = 2/Δ,
 * S12 = 2(AD − BC)/Δ, S22 = (−A + B/Z0 − C·Z0 + D)/Δ.
 */
export function abcdToS(m: Abcd, z0: number): TwoPortS {
  const bz = scale(m.b, 1 / z0), cz = scale(m.c, z0)
  const delta = add(add(m.a, bz), add(cz, m.d))
  const det = sub(mul(m.a, m.d), mul(m.b, m.c))
  return {
    s11: div(sub(add(m.a, bz), add(cz, m.d)), delta),
    s21: div(cx(2), delta),
    s12: div(scale(det, 2), delta),
    s22: div(sub(add(bz, m.d), add(m.a, cz)), delta),
  }
}
