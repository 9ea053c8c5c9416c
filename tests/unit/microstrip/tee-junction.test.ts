import { describe, expect, it } from 'vitest'
import { ETA0 } from '../../../shared/microstrip/constants'
import { teeRangeNotes } from '../../../shared/microstrip/discontinuity-range-notes'
import { teeJunction } from '../../../shared/microstrip/tee-junction'

// Hammerstad, "Computer-aided design of microstrip couplers with accurate discontinuity models", IEEE MTT-S
// Digest 1981, as given in Gupta, Garg, Bahl & Bhartia, "Microstrip Lines and Slotlines", 2nd ed., 1996, ch. 3
// [memory]: the values below are derived by hand from those equations as we recall them.
const h = 0.635e-3, er = 9.8
const widthOf = (arm: { impedance: number, epsEff: number }) => (ETA0 * h) / (arm.impedance * Math.sqrt(arm.epsEff))

describe('microstrip tee junction (Hammerstad 1981)', () => {
  it('equal arms at 0 Hz: d1 = 0.055·D2, d2 = (0.45 − 0.7·e^−1.6)·D1 = 0.30867·D1, n² = 1, B_T = 0 (derived by hand)', () => {
    const arm = { impedance: 50, epsEff: 6.6 }
    const tee = teeJunction(arm, arm, h, er, 0)
    expect(tee.mainShift / widthOf(arm)).toBeCloseTo(0.055, 12)
    expect(tee.branchShift / widthOf(arm)).toBeCloseTo(0.45 - 0.7 * Math.exp(-1.6), 12)
    expect(tee.branchShift / widthOf(arm)).toBeCloseTo(0.30867, 5)
    expect(tee.turnsSquared).toBe(1)
    expect(tee.susceptance).toBe(0)
    // f_p1 = Z1/(2µ0h) = 50/(2·4π·10⁻⁷·0.635 mm) = 31.33 GHz (derived by hand).
    expect(tee.cutoff / 1e9).toBeCloseTo(31.33, 2)
  })

  it('a narrower branch (Z2 ≫ Z1) moves d1 → 0, n² → 1 and the branch plane towards the main strip\'s edge, d2 → D1/2; B_T stays a few per cent of Y1', () => {
    const main = { impedance: 30, epsEff: 7.2 }
    const d1Width = widthOf(main)
    const tees = [75, 100, 150, 300].map(z2 => teeJunction(main, { impedance: z2, epsEff: 5.9 }, h, er, 2e9))
    for (let i = 1; i < tees.length; i++) {
      expect(tees[i]!.mainShift).toBeLessThan(tees[i - 1]!.mainShift)
      expect(tees[i]!.branchShift).toBeGreaterThan(tees[i - 1]!.branchShift)
      expect(tees[i]!.turnsSquared).toBeGreaterThan(tees[i - 1]!.turnsSquared)
    }
    for (const tee of tees) {
      expect(tee.branchShift / d1Width).toBeLessThan(0.5)
      expect(Math.abs(tee.susceptance * 30)).toBeLessThan(0.05)
    }
    // Z2 = 3000 Ω (r = 0.01): d2/D1 = 0.5 − 0.01·(0.05 + 0.7e^−0.016 + 0.25·0.01·x − 0.17·ln 0.01) = 0.4848 (derived by hand, x ≈ 0.004).
    const narrow = teeJunction(main, { impedance: 3000, epsEff: 5.9 }, h, er, 2e9)
    expect(narrow.branchShift / d1Width).toBeCloseTo(0.4848, 3)
    expect(narrow.mainShift / d1Width).toBeLessThan(1e-4)
    expect(1 - narrow.turnsSquared).toBeLessThan(1e-4)
  })

  it('n² = 1 − π·x·(r²/12 + (0.5 − d2/D1)²) falls with frequency; B_T grows in proportion to f at low frequency', () => {
    const main = { impedance: 35.36, epsEff: 7 }, branch = { impedance: 50, epsEff: 6.6 }
    const low = teeJunction(main, branch, h, er, 1e8), lowTwice = teeJunction(main, branch, h, er, 2e8)
    const high = teeJunction(main, branch, h, er, 10e9)
    expect(lowTwice.susceptance / low.susceptance).toBeCloseTo(2, 3)
    expect(high.turnsSquared).toBeLessThan(low.turnsSquared)
    const x = (10e9 / high.cutoff) ** 2, r = 35.36 / 50
    expect(high.turnsSquared).toBeCloseTo(1 - Math.PI * x * (r * r / 12 + (0.5 - high.branchShift / widthOf(main)) ** 2), 14)
  })

  it('warns above half of f_p1 and where the fit puts the branch plane past the centre line', () => {
    const notes = teeRangeNotes(31.33e9, 1e-4)
    expect(notes).toHaveLength(1)
    expect(notes[0]!.above).toBeCloseTo(15.665e9, -6)
    expect(notes[0]!.message).toMatch(/above 15\.7 GHz .* Hammerstad tee model is extrapolated/)
    expect(teeRangeNotes(31.33e9, -1e-5).map(n => n.field)).toEqual(['frequency', 'branchWidth'])
  })
})
