import { describe, expect, it } from 'vitest'
import { analyseMicrostrip } from '../../../shared/microstrip/analyse-microstrip'
import { synthesiseWidth } from '../../../shared/microstrip/synthesise-width'

describe('width synthesis', () => {
  it('round-trips through the analysis to 1e-6 relative (static and at frequency, with thickness)', () => {
    for (const permittivity of [1, 2.2, 3.5, 9.8, 20]) {
      for (const thickness of [0, 35e-6]) {
        const substrate = { permittivity, height: 0.5e-3, thickness, lossTangent: 0, roughness: 0 }
        // A very narrow strip on εr = 20 at 20 GHz cannot reach 150 Ω (dispersion pulls its field into the dielectric).
        for (const impedance of permittivity < 20 ? [15, 25, 50, 70.71, 100, 150] : [15, 25, 50, 70.71, 100]) {
          for (const frequency of [0, 2.45e9, 20e9]) {
            const found = synthesiseWidth(substrate, impedance, frequency)
            if (!found.ok) throw new Error(found.message)
            const back = analyseMicrostrip(substrate, found.width, frequency).impedance
            expect(Math.abs(back / impedance - 1), `εr ${permittivity}, t ${thickness}, ${impedance} Ω, ${frequency} Hz`).toBeLessThan(1e-6)
          }
        }
      }
    }
  })

  it('says which impedances the substrate can give when asked for one it cannot', () => {
    const substrate = { permittivity: 4, height: 1e-3, thickness: 0, lossTangent: 0, roughness: 0 }
    const found = synthesiseWidth(substrate, 500)
    expect(found.ok).toBe(false)
    if (!found.ok) expect(found.message).toMatch(/gives 500 Ω on this substrate \(from [\d.]+ Ω to [\d.]+ Ω\)/)
  })
})
