import { fillDoublySymmetric } from '../math/four-port'
import { checkLineLength, LINE_LENGTH_PARAMS, lineLength } from '../math/line-length'
import type { BlockModel } from '../types'

const { degrees, at, length, velocityFactor, lossDb } = LINE_LENGTH_PARAMS

/**
 * Ideal TEM coupled-line section: 1 in, 2 through (same strip), 3 coupled (beside 1),
 * 4 isolated (beside 2). Solved by even/odd modes: each mode is a uniform line of its own
 * impedance, referred here to √(Ze·Zo), at which the quarter-wave section is matched.
 * The solver renormalises to whatever the terminals meet, so this reference is internal.
 */
export const coupledModel: BlockModel = {
  type: 'coupled',
  terminals: 4,
  description: 'Ideal TEM coupled-line section: even- and odd-mode impedances and a length',
  params: {
    evenImpedance: { kind: 'impedance', required: true, above: 0 },
    oddImpedance: { kind: 'impedance', required: true, above: 0 },
    degrees, at, length, velocityFactor, lossDb,
  },
  check(values) {
    const problems = checkLineLength(values)
    const even = values.evenImpedance as number | undefined, odd = values.oddImpedance as number | undefined
    if (even !== undefined && odd !== undefined && even < odd) {
      problems.push({ field: 'oddImpedance', message: `must not exceed evenImpedance (TEM coupled lines have Ze ≥ Zo; got Ze = ${even} Ω, Zo = ${odd} Ω)` })
    }
    return problems
  },
  create(values) {
    const ze = values.evenImpedance as number
    const zo = values.oddImpedance as number
    const reference = Math.sqrt(ze * zo)
    const { radiansPerHz, nepersPerRadian } = lineLength(values)
    const even = new Float64Array(4)
    const odd = new Float64Array(4)
    const v = new Float64Array(8)
    return {
      ok: true,
      instance: {
        terminals: 4,
        refs: Float64Array.of(reference, reference, reference, reference),
        reciprocal: true,
        constant: false,
        shareKey: `coupled:${ze}:${zo}:${radiansPerHz}:${nepersPerRadian}`,
        fill(frequency, re, im) {
          const theta = radiansPerHz * frequency
          uniformLine(ze / reference, theta, nepersPerRadian * theta, even)
          uniformLine(zo / reference, theta, nepersPerRadian * theta, odd)
          // S11 = (Γe + Γo)/2, S21 = (Te + To)/2, S31 = (Γe − Γo)/2, S41 = (Te − To)/2.
          v[0] = (even[0]! + odd[0]!) / 2; v[1] = (even[1]! + odd[1]!) / 2
          v[2] = (even[2]! + odd[2]!) / 2; v[3] = (even[3]! + odd[3]!) / 2
          v[4] = (even[0]! - odd[0]!) / 2; v[5] = (even[1]! - odd[1]!) / 2
          v[6] = (even[2]! - odd[2]!) / 2; v[7] = (even[3]! - odd[3]!) / 2
          fillDoublySymmetric(v, re, im)
          return true
        },
      },
    }
  },
}

/**
 * Reflection Γ and transmission T (re/im pairs in out) of a uniform line of normalised
 * impedance z, phase θ and attenuation a (Np): Γ = sh·(z − 1/z)/Δ, T = 2/Δ,
 * Δ = 2·ch + sh·(z + 1/z), with ch, sh the cosh and sinh of a + jθ.
 */
export function uniformLine(z: number, theta: number, a: number, out: Float64Array): void {
  const cos = Math.cos(theta), sin = Math.sin(theta)
  const chR = Math.cosh(a) * cos, chI = Math.sinh(a) * sin
  const shR = Math.sinh(a) * cos, shI = Math.cosh(a) * sin
  const sum = z + 1 / z, diff = z - 1 / z
  const dR = 2 * chR + sum * shR, dI = 2 * chI + sum * shI
  const dd = dR * dR + dI * dI
  const nR = diff * shR, nI = diff * shI
  out[0] = (nR * dR + nI * dI) / dd
  out[1] = (nI * dR - nR * dI) / dd
  out[2] = (2 * dR) / dd
  out[3] = (-2 * dI) / dd
}
