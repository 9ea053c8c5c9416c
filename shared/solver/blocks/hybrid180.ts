import { halfCircuit } from '../math/half-circuit'
import type { BlockModel } from '../types'

const DC_FRACTION = 1e-9

function put(re: Float64Array, im: Float64Array, i: number, j: number, r: number, m: number): void {
  re[i * 4 + j] = r; im[i * 4 + j] = m
  re[j * 4 + i] = r; im[j * 4 + i] = m
}
const H = Math.SQRT1_2

// Ideal ring hybrid: S = (−j/√2)[[0, 1, 1, 0], [1, 0, 0, −1], [1, 0, 0, 1], [0, −1, 1, 0]].
const IDEAL_IM = Float64Array.of(0, -H, -H, 0, -H, 0, 0, H, -H, 0, 0, -H, 0, H, -H, 0)

/**
 * 180° hybrid: 1 sum, 2 and 3 outputs, 4 difference. `ring` is a ring of √2·Z lines, 1.5 λ
 * around at `at`, solved in closed form by even/odd modes about the plane through its
 * 3λ/4 arm (ports 1↔3 and 2↔4 mirror).
 */
export const hybrid180Model: BlockModel = {
  type: 'hybrid180',
  terminals: 4,
  description: '180° hybrid: ideal, or ring of lines 1.5 wavelengths around',
  params: {
    impedance: { kind: 'impedance', default: 'referenceImpedance', above: 0 },
    model: { kind: 'choice', choices: ['ideal', 'ring'], default: 'ideal' },
    at: { kind: 'frequency', above: 0 },
  },
  check(values) {
    return values.model === 'ring' && values.at === undefined
      ? [{ field: 'at', message: 'is required for the ring model: the frequency at which the ring is 1.5 wavelengths' }]
      : []
  },
  create(values) {
    const z = values.impedance as number
    const refs = Float64Array.of(z, z, z, z)
    if (values.model === 'ideal') {
      return { ok: true, instance: { terminals: 4, refs, reciprocal: true, constant: true, fill(_f, re, im) { re.fill(0, 0, 16); im.set(IDEAL_IM); return true } } }
    }
    const f0 = values.at as number
    const zRing = Math.SQRT2 * z
    const even = new Float64Array(6)
    const odd = new Float64Array(6)
    return {
      ok: true,
      instance: {
        terminals: 4,
        refs,
        reciprocal: true,
        constant: false,
        shareKey: `hybrid180:ring:${z}:${f0}`,
        fill(frequency, re, im) {
          const q = (Math.PI / 2) * (Math.max(frequency, f0 * DC_FRACTION) / f0)
          const cosQ = Math.cos(q), sinQ = Math.sin(q)
          // Half circuit: λ/8 stub at port 1, λ/4 line 1–2, 3λ/8 stub at port 2.
          const ca = Math.cos(q / 2), sa = Math.sin(q / 2)
          const cb = Math.cos(1.5 * q), sb = Math.sin(1.5 * q)
          halfCircuit(cosQ, sinQ, zRing, sa / zRing, ca, sb / zRing, cb, z, even)
          halfCircuit(cosQ, sinQ, zRing, -ca / zRing, sa, -cb / zRing, sb, z, odd)
          const s11R = (even[0]! + odd[0]!) / 2, s11I = (even[1]! + odd[1]!) / 2
          const s22R = (even[2]! + odd[2]!) / 2, s22I = (even[3]! + odd[3]!) / 2
          const s12R = (even[4]! + odd[4]!) / 2, s12I = (even[5]! + odd[5]!) / 2
          const s14R = (even[4]! - odd[4]!) / 2, s14I = (even[5]! - odd[5]!) / 2
          put(re, im, 0, 0, s11R, s11I); put(re, im, 2, 2, s11R, s11I)
          put(re, im, 1, 1, s22R, s22I); put(re, im, 3, 3, s22R, s22I)
          put(re, im, 0, 2, (even[0]! - odd[0]!) / 2, (even[1]! - odd[1]!) / 2)
          put(re, im, 1, 3, (even[2]! - odd[2]!) / 2, (even[3]! - odd[3]!) / 2)
          put(re, im, 0, 1, s12R, s12I); put(re, im, 2, 3, s12R, s12I)
          put(re, im, 0, 3, s14R, s14I); put(re, im, 1, 2, s14R, s14I)
          return true
        },
      },
    }
  },
}
