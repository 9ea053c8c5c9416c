// Conversion of Y, Z, H and G data to S, checked against published formulas.
import { describe, expect, it } from 'vitest'
import { toScattering } from '../../../shared/touchstone/to-scattering'
import { seededRandom } from '../../support/seeded-random'

type C = [number, number]
const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]]
const add = (a: C, b: C): C => [a[0] + b[0], a[1] + b[1]]
const sub = (a: C, b: C): C => [a[0] - b[0], a[1] - b[1]]
const div = (a: C, b: C): C => { const d = b[0] * b[0] + b[1] * b[1]; return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d] }
const scale = (a: C, k: number): C => [a[0] * k, a[1] * k]

/** Converts a row-major 2×2 complex matrix with toScattering; returns S as C[]. */
function convert(kind: 'Y' | 'Z' | 'H' | 'G', m: C[], refs: number[]): C[] {
  const n = refs.length
  const re = Float64Array.from(m, v => v[0]), im = Float64Array.from(m, v => v[1])
  const oR = new Float64Array(n * n), oI = new Float64Array(n * n)
  expect(toScattering(kind, n, re, im, refs, false, oR, oI)).toBe(true)
  return Array.from(oR, (r, i): C => [r, oI[i]!])
}

const close = (a: C, b: C, tolerance = 1e-12) => expect(Math.hypot(a[0] - b[0], a[1] - b[1])).toBeLessThan(tolerance)

describe('Y and Z to S against Pozar, Microwave Engineering, 4th ed., §4.3, Table 4.2', () => {
  const random = seededRandom(4321)
  const value = (size: number): C => [(random() - 0.3) * size, (random() - 0.5) * size]

  it('Z → S for two-ports with equal references Z0 (Table 4.2, S in terms of Z)', () => {
    for (let trial = 0; trial < 50; trial++) {
      const z0 = 20 + 80 * random()
      const [z11, z12, z21, z22] = [value(200), value(200), value(200), value(200)]
      const d = sub(mul(add(z11, [z0, 0]), add(z22, [z0, 0])), mul(z12, z21))
      const expected: C[] = [
        div(sub(mul(sub(z11, [z0, 0]), add(z22, [z0, 0])), mul(z12, z21)), d),
        div(scale(z12, 2 * z0), d),
        div(scale(z21, 2 * z0), d),
        div(sub(mul(add(z11, [z0, 0]), sub(z22, [z0, 0])), mul(z12, z21)), d),
      ]
      convert('Z', [z11, z12, z21, z22], [z0, z0]).forEach((v, i) => close(v, expected[i]!))
    }
  })

  it('Y → S for two-ports with equal references (Table 4.2, S in terms of Y, Y0 = 1/Z0)', () => {
    for (let trial = 0; trial < 50; trial++) {
      const z0 = 20 + 80 * random()
      const y0: C = [1 / z0, 0]
      const [y11, y12, y21, y22] = [value(0.05), value(0.05), value(0.05), value(0.05)]
      const d = sub(mul(add(y11, y0), add(y22, y0)), mul(y12, y21))
      const expected: C[] = [
        div(add(mul(sub(y0, y11), add(y0, y22)), mul(y12, y21)), d),
        div(scale(y12, -2 / z0), d),
        div(scale(y21, -2 / z0), d),
        div(add(mul(add(y0, y11), sub(y0, y22)), mul(y12, y21)), d),
      ]
      convert('Y', [y11, y12, y21, y22], [z0, z0]).forEach((v, i) => close(v, expected[i]!))
    }
  })

  it('closed form: a series R–L between 50 Ω ports', () => {
    // Z of a series impedance Zs does not exist; Y = [[1/Zs, −1/Zs], [−1/Zs, 1/Zs]].
    // Pozar, Microwave Engineering, 4th ed., series impedance two-port: S11 = Zs/(Zs + 2Z0), S21 = 2Z0/(Zs + 2Z0).
    const zs: C = [25, 2 * Math.PI * 1e9 * 5e-9]
    const y = div([1, 0], zs)
    const s = convert('Y', [y, scale(y, -1), scale(y, -1), y], [50, 50])
    close(s[0]!, div(zs, add(zs, [100, 0])))
    close(s[2]!, div([100, 0], add(zs, [100, 0])))
  })

  it('n ports with unequal references: converting back with Z = R^½ (I + S)(I − S)⁻¹ R^½ returns the data', () => {
    // Pozar, Microwave Engineering, 4th ed., §4.3: [Z] = ([U] + [S])([U] − [S])⁻¹ for normalised ports.
    const n = 3
    const refs = [50, 75, 30]
    const z: C[] = Array.from({ length: n * n }, () => value(100))
    for (let i = 0; i < n; i++) z[i * n + i] = add(z[i * n + i]!, [150, 0])
    const s = convert('Z', z, refs)
    // Solve (I − S)ᵀ Xᵀ = (I + S)ᵀ by hand-rolled Gauss–Jordan on complex numbers.
    const a: C[][] = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => sub([i === j ? 1 : 0, 0], s[i * n + j]!)))
    const b: C[][] = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => add([i === j ? 1 : 0, 0], s[i * n + j]!)))
    // Z' = B · A⁻¹: compute A⁻¹ by Gauss–Jordan.
    const inv: C[][] = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j): C => [i === j ? 1 : 0, 0]))
    for (let c = 0; c < n; c++) {
      const p = a[c]![c]!
      for (let j = 0; j < n; j++) { a[c]![j] = div(a[c]![j]!, p); inv[c]![j] = div(inv[c]![j]!, p) }
      for (let r = 0; r < n; r++) {
        if (r === c) continue
        const f = a[r]![c]!
        for (let j = 0; j < n; j++) { a[r]![j] = sub(a[r]![j]!, mul(f, a[c]![j]!)); inv[r]![j] = sub(inv[r]![j]!, mul(f, inv[c]![j]!)) }
      }
    }
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        let zn: C = [0, 0]
        for (let k = 0; k < n; k++) zn = add(zn, mul(b[i]![k]!, inv[k]![j]!))
        close(scale(zn, Math.sqrt(refs[i]! * refs[j]!)), z[i * n + j]!, 1e-9)
      }
    }
  })

  it('data with no S equivalent (Z = −R at a port) is reported, not turned into infinities', () => {
    const oR = new Float64Array(1), oI = new Float64Array(1)
    expect(toScattering('Z', 1, Float64Array.of(-50), Float64Array.of(0), [50], false, oR, oI)).toBe(false)
  })
})
