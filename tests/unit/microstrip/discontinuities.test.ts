import { describe, expect, it } from 'vitest'
import { openEndExtension } from '../../../shared/microstrip/open-end-extension'
import { openEndExtensionHammerstad } from '../../../shared/microstrip/open-end-extension-hammerstad'
import { staticMicrostrip } from '../../../shared/microstrip/static-microstrip'
import { stepParasitics } from '../../../shared/microstrip/step-parasitics'
import { bendParasitics } from '../../../shared/microstrip/bend-parasitics'
import { bendRangeNotes, stepRangeNotes } from '../../../shared/microstrip/discontinuity-range-notes'

describe('open-end length extension', () => {
  it('Kirschning–Jansen–Koster 1981 and Hammerstad 1975 agree within 5 % for 0.5 ≤ W/h ≤ 2', () => {
    // Two published models of the same effect; the 1981 paper reports the 1975 form good to a few per cent in this range [memory].
    for (const er of [2.2, 4.4, 9.8]) {
      for (const u of [0.5, 1, 2]) {
        const e = staticMicrostrip(u, 0, er).epsEff
        const a = openEndExtension(u, er, e), b = openEndExtensionHammerstad(u, e)
        expect(Math.abs(a / b - 1), `εr ${er}, u ${u}`).toBeLessThan(0.05)
      }
    }
  })

  it('is a fraction of the height that grows with the width (0.2…0.7 h) [common practice]', () => {
    let previous = 0
    for (const u of [0.1, 0.3, 1, 3, 10, 30]) {
      const d = openEndExtension(u, 9.8, staticMicrostrip(u, 0, 9.8).epsEff)
      expect(d).toBeGreaterThan(previous)
      expect(d).toBeGreaterThan(0.1)
      expect(d).toBeLessThan(0.7)
      previous = d
    }
  })
})

describe('step in width', () => {
  const h = 1e-3

  it('vanishes for equal widths', () => {
    expect(stepParasitics(h, h, h, 9.6)).toEqual({ inductance: 0, capacitance: 0 })
    expect(stepRangeNotes(h, h, h, 9.6)).toEqual([])
  })

  it('the two capacitance fits meet at W1/W2 = 3.5 for εr = 9.6 (within 3 %)', () => {
    // Gupta, Garg, Bahl & Bhartia, Microstrip Lines and Slotlines, 2nd ed., §3.4 [memory]: the ranges join at 3.5.
    const below = stepParasitics(3.5 * h, h, h, 9.6).capacitance
    const above = stepParasitics(3.5000001 * h, h, h, 9.6).capacitance
    expect(Math.abs(above / below - 1)).toBeLessThan(0.03)
  })

  it('inductance L/h in nH/m = 40.5(r − 1) − 75·log r + 0.2(r − 1)²: 18.12 at r = 2', () => {
    // Same source; 40.5 − 75·log10 2 + 0.2 = 18.123 (derived by hand).
    expect(stepParasitics(2 * h, h, h, 9.6).inductance / h * 1e9).toBeCloseTo(18.123, 3)
    // C/√(W1W2) in pF/m at r = 2, εr = 9.6: (10.1·log 9.6 + 2.33)·2 − 12.6·log 9.6 − 3.17 = 8.955 (derived by hand).
    expect(stepParasitics(2 * h, h, h, 9.6).capacitance / 1e-12 / Math.sqrt(2 * h * h)).toBeCloseTo(8.955, 3)
  })

  it('warns outside the fitted ranges', () => {
    expect(stepRangeNotes(1.2 * h, h, h, 9.6).map(n => n.message).join('\n')).toMatch(/below 1\.5/)
    expect(stepRangeNotes(6 * h, h, h, 4).map(n => n.message).join('\n')).toMatch(/εr = 9\.6/)
  })
})

describe('right-angle bend', () => {
  it('square corner at W/h = 1, εr = 9.6: C/W = 149.37 pF/m, L/h = −21 nH/m (derived by hand from the closed forms)', () => {
    // Gupta, Garg, Bahl & Bhartia 1996 [memory]: (9.5·9.6 + 1.25)·1 + 5.2·9.6 + 7.0 = 149.37; 100·(4 − 4.21) = −21.
    const p = bendParasitics(1e-3, 1e-3, 9.6, 'square')
    expect(p.capacitance / 1e-3 / 1e-12).toBeCloseTo(149.37, 6)
    expect(p.inductance / 1e-3 / 1e-9).toBeCloseTo(-21, 9)
  })

  it('mitred corner at W/h = 1, εr = 9.6: C/W = 3.93·9.6 + 0.62 + 7.6·9.6 + 3.8 pF/m (derived by hand)', () => {
    // Kirschning, Jansen & Koster 1983 [memory]; L/h = 440.2·(1 − 1.062·e^(−0.177)) = 84.69 nH/m.
    const p = bendParasitics(1e-3, 1e-3, 9.6, 'mitred')
    expect(p.capacitance / 1e-3 / 1e-12).toBeCloseTo(3.93 * 9.6 + 0.62 + 7.6 * 9.6 + 3.8, 9)
    expect(p.inductance / 1e-3 / 1e-9).toBeCloseTo(440.2 * (1 - 1.062 * Math.exp(-0.177)), 9)
    expect(bendRangeNotes(1, 9.6, 'mitred')).toEqual([])
    expect(bendRangeNotes(8, 12, 'mitred').map(n => n.field)).toEqual(['width', 'permittivity'])
  })
})
