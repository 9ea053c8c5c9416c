import { describe, expect, it } from 'vitest'
import { prepareNetwork } from '../../../shared/solver/index'
import { abs, div, doc, port, s, solveAt, type C } from './helpers'

const F0 = 3e9
const ports = [1, 2, 3, 4].map(i => port(i))
const wires: Array<[string, string]> = [1, 2, 3, 4].map(i => [`P${i}.1`, `K.${i}`])
const section = (params: Record<string, unknown>) => doc([...ports, { id: 'K', type: 'coupled', params }], wires)
const zEven = (z0: number, c: number) => z0 * Math.sqrt((1 + c) / (1 - c))
const zOdd = (z0: number, c: number) => z0 * Math.sqrt((1 - c) / (1 + c))

describe('coupled-line section', () => {
  it('matches the closed-form coupled and through voltages at every length', () => {
    // Pozar, Microwave Engineering, 4th ed., §7.6 (single-section coupler, Z0 = √(Z0e·Z0o)):
    // V3/V1 = jC·tanθ/(√(1 − C²) + j·tanθ), V2/V1 = √(1 − C²)/(√(1 − C²)·cosθ + j·sinθ),
    // C = (Z0e − Z0o)/(Z0e + Z0o); S11 = S41 = 0 [memory: equation numbers not given].
    const c = 10 ** (-10 / 20)
    const root = Math.sqrt(1 - c * c)
    const frequencies = [0.3, 0.7, 1, 1.4, 1.9].map(x => x * F0)
    const r = solveAt(section({ evenImpedance: zEven(50, c), oddImpedance: zOdd(50, c), degrees: 90, at: F0 }), frequencies)
    frequencies.forEach((f, k) => {
      const theta = (Math.PI / 2) * (f / F0)
      const coupled = div([0, c * Math.tan(theta)], [root, Math.tan(theta)])
      const through = div([root, 0], [root * Math.cos(theta), Math.sin(theta)])
      const expectNear = (got: C, want: C) => expect(Math.hypot(got[0] - want[0], got[1] - want[1])).toBeLessThan(1e-12)
      expectNear(s(r, 3, 1, k), coupled)
      expectNear(s(r, 2, 1, k), through)
      expect(abs(s(r, 1, 1, k))).toBeLessThan(1e-12)
      expect(abs(s(r, 4, 1, k))).toBeLessThan(1e-12)
    })
  })

  it('a quarter-wave 20 dB section couples −20 dB, in quadrature with the through port', () => {
    // Pozar, 4th ed., §7.6, Example 7.7 [memory]: 20 dB, Z0 = 50 Ω → Z0e = 55.28 Ω, Z0o = 45.23 Ω.
    expect(zEven(50, 0.1)).toBeCloseTo(55.28, 2)
    expect(zOdd(50, 0.1)).toBeCloseTo(45.23, 2)
    const r = solveAt(section({ evenImpedance: 55.28, oddImpedance: 45.23, degrees: 90, at: F0 }), [F0])
    // C = (Z0e − Z0o)/(Z0e + Z0o) at the quarter wave (Pozar, 4th ed., §7.6); the rounded
    // impedances give Z0e·Z0o = 2500.3 Ω², a 50 Ω mismatch that moves |S31| by ~4e-10.
    expect(abs(s(r, 3, 1))).toBeCloseTo((55.28 - 45.23) / (55.28 + 45.23), 8)
    expect(20 * Math.log10(abs(s(r, 3, 1)))).toBeCloseTo(-20, 2)
    const phase = (x: C) => (Math.atan2(x[1], x[0]) * 180) / Math.PI
    expect(phase(s(r, 3, 1)) - phase(s(r, 2, 1))).toBeCloseTo(90, 6)
    // Lossless: |S21|² + |S31|² = 1.
    expect(abs(s(r, 2, 1)) ** 2 + abs(s(r, 3, 1)) ** 2).toBeCloseTo(1, 8)
  })

  it('mismatched terminations: S follows from the even and odd lines referred to 50 Ω', () => {
    // Even/odd-mode superposition (Pozar, 4th ed., §7.6): with Z0e·Z0o ≠ Z0², S11 = (Γe + Γo)/2,
    // each Γ that of a uniform line of Z0e (Z0o) between 50 Ω terminations, 90° long:
    // Γ = (z² − 1)/(z² + 1), z = Zmode/50.
    const r = solveAt(section({ evenImpedance: 100, oddImpedance: 40, degrees: 90, at: F0 }), [F0])
    const gamma = (z: number) => (z * z - 1) / (z * z + 1)
    expect(s(r, 1, 1)[0]).toBeCloseTo((gamma(2) + gamma(0.8)) / 2, 12)
    expect(s(r, 3, 1)[0]).toBeCloseTo((gamma(2) - gamma(0.8)) / 2, 12)
  })

  it('physical length with a velocity factor equals the same electrical length', () => {
    const c0 = 299_792_458
    const electrical = solveAt(section({ evenImpedance: 69.4, oddImpedance: 36, degrees: 90, at: F0 }), [2.2e9])
    const physical = solveAt(section({ evenImpedance: 69.4, oddImpedance: 36, length: (0.7 * c0) / F0 / 4, velocityFactor: 0.7 }), [2.2e9])
    expect(abs([s(electrical, 3, 1)[0] - s(physical, 3, 1)[0], s(electrical, 3, 1)[1] - s(physical, 3, 1)[1]])).toBeLessThan(1e-12)
  })

  it('names the field when the odd impedance exceeds the even one or the length is missing', () => {
    const bad = prepareNetwork(section({ evenImpedance: 40, oddImpedance: 60, degrees: 90, at: F0 }))
    expect(bad.ok).toBe(false)
    if (!bad.ok) expect(bad.problems.map(p => p.field)).toContain('oddImpedance')
    const missing = prepareNetwork(section({ evenImpedance: 60, oddImpedance: 40 }))
    expect(missing.ok).toBe(false)
    if (!missing.ok) expect(missing.problems.map(p => p.field)).toContain('degrees')
  })
})
