import { fillDoublySymmetric } from '../math/four-port'
import { halfCircuit } from '../math/half-circuit'
import type { BlockModel } from '../types'

// Below this the branch model is taken at f → 0⁺: at exactly 0 Hz its odd-mode stubs are both
// zero-length shorts and the half circuit is 0/0.
const DC_FRACTION = 1e-9

/**
 * Quadrature hybrid: 1 in, 2 through, 3 coupled, 4 isolated. `ideal` is frequency-independent;
 * `branch` is a one-section branch-line of ideal lines solved in closed form by even/odd modes.
 */
export const hybrid90Model: BlockModel = {
  type: 'hybrid90',
  terminals: 4,
  description: 'Quadrature (90°) hybrid: ideal, or one-section branch-line of quarter-wave lines',
  params: {
    impedance: { kind: 'impedance', default: 'referenceImpedance', above: 0 },
    model: { kind: 'choice', choices: ['ideal', 'branch'], default: 'ideal' },
    couplingDb: { kind: 'decibel', default: 10 * Math.log10(2), above: 0 },
    at: { kind: 'frequency', above: 0 },
  },
  check(values) {
    return values.model === 'branch' && values.at === undefined
      ? [{ field: 'at', message: 'is required for the branch model: the frequency at which the arms are a quarter wave' }]
      : []
  },
  create(values) {
    const z = values.impedance as number
    const c = 10 ** (-(values.couplingDb as number) / 20)
    const t = Math.sqrt(1 - c * c)
    const refs = Float64Array.of(z, z, z, z)
    const v = new Float64Array(8)
    if (values.model === 'ideal') {
      // From port 1: through −j·t (−90°), coupled −c (−180°), isolated 0.
      v[3] = -t
      v[4] = -c
      return { ok: true, instance: { terminals: 4, refs, reciprocal: true, constant: true, fill(_f, re, im) { fillDoublySymmetric(v, re, im); return true } } }
    }
    const f0 = values.at as number
    // Through arms √(1 − c²)·Z, shunt arms that over c; equal split gives Z/√2 and Z.
    const zThrough = t * z
    const zShunt = (t / c) * z
    const even = new Float64Array(6)
    const odd = new Float64Array(6)
    return {
      ok: true,
      instance: {
        terminals: 4,
        refs,
        reciprocal: true,
        constant: false,
        shareKey: `hybrid90:branch:${z}:${c}:${f0}`,
        fill(frequency, re, im) {
          const theta = (Math.PI / 2) * (Math.max(frequency, f0 * DC_FRACTION) / f0)
          const cosT = Math.cos(theta), sinT = Math.sin(theta)
          const cosH = Math.cos(theta / 2), sinH = Math.sin(theta / 2)
          // Even mode: open λ/8 stubs, Y = j tan(θ/2)/Zs; odd mode: short stubs, Y = −j cot(θ/2)/Zs.
          halfCircuit(cosT, sinT, zThrough, sinH / zShunt, cosH, sinH / zShunt, cosH, z, even)
          halfCircuit(cosT, sinT, zThrough, -cosH / zShunt, sinH, -cosH / zShunt, sinH, z, odd)
          v[0] = (even[0]! + odd[0]!) / 2; v[1] = (even[1]! + odd[1]!) / 2
          v[2] = (even[4]! + odd[4]!) / 2; v[3] = (even[5]! + odd[5]!) / 2
          v[4] = (even[4]! - odd[4]!) / 2; v[5] = (even[5]! - odd[5]!) / 2
          v[6] = (even[0]! - odd[0]!) / 2; v[7] = (even[1]! - odd[1]!) / 2
          fillDoublySymmetric(v, re, im)
          return true
        },
      },
    }
  },
}
