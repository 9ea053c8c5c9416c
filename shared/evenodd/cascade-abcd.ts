import { add, cx, mul, scale } from './complex'
import type { Abcd, Complex } from './types'

/** ABCD of two two-ports in cascade: the matrix product first · second. */
export function cascadeAbcd(first: Abcd, second: Abcd): Abcd {
  return {
    a: add(mul(first.a, second.a), mul(first.b, second.c)),
    b: add(mul(first.a, second.b), mul(first.b, second.d)),
    c: add(mul(first.c, second.a), mul(first.d, second.c)),
    d: add(mul(first.c, second.b), mul(first.d, second.d)),
  }
}

/** ABCD of a shunt admittance Y: [[1, 0], [Y, 1]] (Pozar, Microwave Engineering, 4th ed., Table 4.1). */
export function shuntAbcd(y: Complex): Abcd {
  return { a: cx(1), b: cx(0), c: y, d: cx(1) }
}

/** ABCD of a lossless line of impedance z and electrical length θ: [[cos θ, jZ sin θ], [j sin θ/Z, cos θ]] (Pozar Table 4.1). */
export function lineAbcd(z: number, theta: number): Abcd {
  return { a: cx(Math.cos(theta)), b: cx(0, z * Math.sin(theta)), c: cx(0, Math.sin(theta) / z), d: cx(Math.cos(theta)) }
}

/** Input admittance of a lossless stub of impedance z and length θ: open end j·tan θ/Z, short end −j·cot θ/Z (Pozar eqs. 2.45, 2.42). */
export function stubAdmittance(z: number, theta: number, end: 'open' | 'short'): Complex {
  return end === 'open' ? cx(0, Math.tan(theta) / z) : scale(cx(0, -1 / Math.tan(theta)), 1 / z)
}
