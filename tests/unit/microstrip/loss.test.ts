import { describe, expect, it } from 'vitest'
import { C0, ETA0 } from '../../../shared/microstrip/constants'
import { conductorLoss } from '../../../shared/microstrip/conductor-loss'
import { dielectricLoss } from '../../../shared/microstrip/dielectric-loss'
import { roughnessFactor } from '../../../shared/microstrip/roughness-factor'
import { skinDepth } from '../../../shared/microstrip/skin-depth'
import { staticMicrostrip } from '../../../shared/microstrip/static-microstrip'
import { surfaceResistance } from '../../../shared/microstrip/surface-resistance'

const COPPER = 5.813e7 // S/m (Pozar, Microwave Engineering, 4th ed., Appendix F [memory])

describe('microstrip losses', () => {
  it('skin depth and surface resistance of copper at 1 GHz', () => {
    // δ = 1/√(πfµ0σ) = 2.088 µm and Rs = 1/(σδ) = 8.24 mΩ (derived by hand; Pozar quotes δ ≈ 2.1 µm at 1 GHz [memory]).
    expect(skinDepth(1e9, COPPER)).toBeCloseTo(2.088e-6, 8)
    expect(surfaceResistance(1e9, COPPER)).toBeCloseTo(1 / (COPPER * skinDepth(1e9, COPPER)), 12)
    expect(surfaceResistance(1e9, COPPER)).toBeCloseTo(8.24e-3, 5)
  })

  it('roughness factor: 1 when smooth, 1 + (2/π)·arctan 1.4 at Δ = δ, at most 2', () => {
    // Hammerstad & Bekkadal 1975; 1 + (2/π)·atan(1.4) = 1.6051 (derived by hand).
    expect(roughnessFactor(0, 1e-6)).toBe(1)
    expect(roughnessFactor(1e-6, 1e-6)).toBeCloseTo(1.6051, 4)
    expect(roughnessFactor(1e-3, 1e-6)).toBeLessThan(2)
    expect(roughnessFactor(1e-3, 1e-6)).toBeGreaterThan(1.999)
  })

  it('a rough conductor loses more by exactly the Hammerstad–Bekkadal factor', () => {
    const line = staticMicrostrip(2, 0, 4)
    const metal = { width: 2e-3, conductivity: COPPER, roughness: 0, impedance: line.impedance, airImpedance: line.airImpedance }
    const delta = skinDepth(5e9, COPPER)
    const rough = conductorLoss(5e9, { ...metal, roughness: delta }) / conductorLoss(5e9, metal)
    expect(rough).toBeCloseTo(1 + (2 / Math.PI) * Math.atan(1.4), 12)
  })

  it('conductor loss tends to Pozar eq. 3.199, Rs/(Z0·W), for wide strips', () => {
    // Pozar, 4th ed., eq. 3.199 [memory] is the wide-strip (parallel-plate) value; the current-distribution factor
    // exp(−1.2(Z01/η0)^0.7) of Hammerstad & Jensen tends to 1 there.
    const height = 1e-3, width = 1000 * height
    const line = staticMicrostrip(width / height, 0, 4)
    const alpha = conductorLoss(1e9, { width, conductivity: COPPER, roughness: 0, impedance: line.impedance, airImpedance: line.airImpedance })
    const pozar = surfaceResistance(1e9, COPPER) / (line.impedance * width)
    expect(Math.abs(alpha / pozar - 1)).toBeLessThan(0.015)
    // For a 50 Ω-like strip the factor is the paper's exp(−1.2(Z01/η0)^0.7) exactly.
    const narrow = staticMicrostrip(2, 0, 4)
    const a2 = conductorLoss(1e9, { width: 2e-3, conductivity: COPPER, roughness: 0, impedance: narrow.impedance, airImpedance: narrow.airImpedance })
    expect(a2 / (surfaceResistance(1e9, COPPER) / (narrow.impedance * 2e-3))).toBeCloseTo(Math.exp(-1.2 * (narrow.airImpedance / ETA0) ** 0.7), 12)
  })

  it('dielectric loss: the TEM value k·tan δ/2 when fully filled, none in air', () => {
    // Pozar, 4th ed., eq. 3.198 [memory]; with ε_eff = εr it is k0·√εr·tan δ/2, the TEM value (Pozar eq. 2.? [common practice]).
    const f = 10e9, er = 3.5, tand = 0.002
    const k = (2 * Math.PI * f * Math.sqrt(er)) / C0
    expect(dielectricLoss(f, er, er, tand)).toBeCloseTo((k * tand) / 2, 12)
    expect(dielectricLoss(f, er, 1, tand)).toBe(0)
    expect(dielectricLoss(f, 1, 1, tand)).toBe(0)
    // Filling factor q = (ε_eff − 1)/(εr − 1) scales it between the two (derived by hand).
    const mid = dielectricLoss(f, er, 2.7, tand)
    expect(mid).toBeCloseTo((2 * Math.PI * f / C0) * er * 1.7 * tand / (2 * Math.sqrt(2.7) * 2.5), 12)
  })
})
