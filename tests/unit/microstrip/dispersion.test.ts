import { describe, expect, it } from 'vitest'
import { analyseMicrostrip } from '../../../shared/microstrip/analyse-microstrip'
import { dispersiveEffectivePermittivity } from '../../../shared/microstrip/dispersive-effective-permittivity'
import { dispersiveImpedance } from '../../../shared/microstrip/dispersive-impedance'
import { staticMicrostrip } from '../../../shared/microstrip/static-microstrip'

// Properties of Kirschning & Jansen, Electronics Letters 18, pp. 272–273, 1982: ε_eff(f) starts at the
// static value and rises monotonically towards εr. Jansen & Kirschning, AEÜ 37, 1983: Z0(f) starts at the static Z0.
describe('Kirschning–Jansen dispersion', () => {
  const cases = [{ er: 2.2, u: 3 }, { er: 4.4, u: 1.9 }, { er: 9.8, u: 0.95 }, { er: 12.9, u: 0.3 }]

  it('equals the static ε_eff at f = 0 and approaches it as f → 0', () => {
    for (const { er, u } of cases) {
      const e0 = staticMicrostrip(u, 0, er).epsEff
      expect(dispersiveEffectivePermittivity(u, er, e0, 0)).toBe(e0)
      expect(Math.abs(dispersiveEffectivePermittivity(u, er, e0, 1e-6) / e0 - 1)).toBeLessThan(1e-9)
    }
  })

  it('rises monotonically towards εr and stays below it', () => {
    for (const { er, u } of cases) {
      const e0 = staticMicrostrip(u, 0, er).epsEff
      let previous = e0
      const wrong: number[] = []
      for (let fn = 0.25; fn <= 1000; fn += 0.25) {
        const e = dispersiveEffectivePermittivity(u, er, e0, fn)
        if (!(e > previous && e < er)) wrong.push(fn)
        previous = e
      }
      expect(wrong, `εr ${er}, u ${u}: not rising below εr at these fn`).toEqual([])
      // Far beyond the stated range (fn = 1000 GHz·mm) nearly all the field is in the dielectric.
      expect(er - previous).toBeLessThan(0.01 * (er - e0))
    }
  })

  it('gives the static impedance at f = 0 (R13/R14 = 1) and a continuous Z0(f) near it', () => {
    for (const { er, u } of cases) {
      const s = staticMicrostrip(u, 0, er)
      expect(dispersiveImpedance(u, er, s.impedance, s.epsEff, s.epsEff, 0)).toBeCloseTo(s.impedance, 12)
      const e = dispersiveEffectivePermittivity(u, er, s.epsEff, 1e-3)
      expect(Math.abs(dispersiveImpedance(u, er, s.impedance, s.epsEff, e, 1e-3) / s.impedance - 1)).toBeLessThan(1e-6)
    }
  })

  it('the analysis at 0 Hz is the static one; at frequency it uses f·h in GHz·mm', () => {
    const substrate = { permittivity: 9.8, height: 0.635e-3, thickness: 0, lossTangent: 0, roughness: 0 }
    const s = staticMicrostrip(0.6 / 0.635, 0, 9.8)
    const at0 = analyseMicrostrip(substrate, 0.6e-3, 0)
    expect(at0.impedance).toBe(s.impedance)
    expect(at0.epsEff).toBe(s.epsEff)
    // fn = 10 GHz × 0.635 mm = 6.35 GHz·mm (derived by hand).
    expect(analyseMicrostrip(substrate, 0.6e-3, 10e9).epsEff).toBe(dispersiveEffectivePermittivity(0.6 / 0.635, 9.8, s.epsEff, 6.35))
  })
})
