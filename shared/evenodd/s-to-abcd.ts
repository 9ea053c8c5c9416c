import { add, cx, div, mul, scale, sub } from './complex'
import type { Abcd, TwoPortS } from './types'

/**
 * ABCD of a two-port from its S referred to z0 at both ports (Pozar, Microwave Engineering,
 * 4th ed., Table 4.2): A = ((1 + S11)(1 − S22) + S12S21)/2S21, B = Z0((1 + S11)(1 + S22) − S12S21)/2S21,
 * C = ((1 − S11)(1 − S22) − S12S21)/(2S21·Z0), D = ((1 − S11)(1 + S22) + S12S21)/2S21.
 */
export function sToAbcd(s: TwoPortS, z0: number): Abcd {
  const one = cx(1)
  const p = mul(s.s12, s.s21)
  const den = scale(s.s21, 2)
  return {
    a: div(add(mul(add(one, s.s11), sub(one, s.s22)), p), den),
    b: scale(div(sub(mul(add(one, s.s11), add(one, s.s22)), p), den), z0),
    c: scale(div(sub(mul(sub(one, s.s11), sub(one, s.s22)), p), den), 1 / z0),
    d: div(add(mul(sub(one, s.s11), add(one, s.s22)), p), den),
  }
}
