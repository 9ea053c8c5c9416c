import { describe, expect, it } from 'vitest'
import { arrayFactorPower, arrayPatternDb, beamFigures, beamWeights, bisectRoot, crossoverDb, goldenSectionMax, type ArrayWeights } from '../../../shared/beams/index'
import { butlerMatrix4x4 } from '../../../shared/examples/index'
import { solveAt } from '../solver/helpers'

const deg = (rad: number) => (rad * 180) / Math.PI
/** N equal amplitudes 1/√N with a progressive phase of `stepDeg` per element (a lossless N-way feed). */
function progressive(n: number, stepDeg: number): ArrayWeights {
  const re = new Float64Array(n), im = new Float64Array(n)
  for (let k = 0; k < n; k++) {
    re[k] = Math.cos((k * stepDeg * Math.PI) / 180) / Math.sqrt(n)
    im[k] = Math.sin((k * stepDeg * Math.PI) / 180) / Math.sqrt(n)
  }
  return { re, im }
}

describe('uniform linear array', () => {
  it('steers to sin θ = −β/(2π d) for a progressive phase β (Balanis, Antenna Theory, 3rd ed., §6.3 [memory])', () => {
    // The four beams of an ideal 4×4 beamforming matrix at half-wavelength spacing: β = −45°, +135°, −135°, +45°.
    // With AF = Σ a_n e^{j2πnd sin θ} and a_n = e^{jnβ}, the phases add in step where 2πd sin θ + β = 0
    // (derived by hand for this sign convention).
    for (const beta of [-45, 135, -135, 45]) {
      const figures = beamFigures(progressive(4, beta), { spacing: 0.5 })
      expect(figures.peakDeg).toBeCloseTo(deg(Math.asin(-beta / 180)), 5)
      // Lossless feed of N equal, steered elements: |AF|²/N = 1 at the peak (contract's definition).
      expect(figures.peakDb).toBeCloseTo(0, 9)
    }
  })

  it('half-power width ≈ 0.886 λ/(N d) rad and first sidelobe ≈ −13.26 dB at broadside for a long uniform array', () => {
    // Balanis, Antenna Theory, 3rd ed., §6.3 [memory]: broadside HPBW ≈ 0.886·λ/(N d) rad for large N, and the
    // first sidelobe of uniform excitation at −13.26 dB (N = 32 is within 0.05 dB of that limit).
    const n = 32, d = 0.5
    const figures = beamFigures(progressive(n, 0), { spacing: d })
    expect(figures.peakDeg).toBeCloseTo(0, 6)
    expect(figures.halfPowerWidthDeg / deg(0.886 / (n * d))).toBeCloseTo(1, 2)
    expect(figures.sidelobeDb!).toBeCloseTo(-13.26, 1)
    expect(figures.halfPower.lowDeg).toBeCloseTo(-figures.halfPower.highDeg, 9)
  })

  it('two elements half a wavelength apart: |AF|²/N = cos²(π/2 · sin θ), half power at ±30°, no sidelobe', () => {
    // Derived by hand: AF = (1 + e^{jπ sin θ})/√2, |AF|²/2 = cos²((π/2) sin θ); equals 1/2 where sin θ = 1/2, 0 at 90°.
    const weights = progressive(2, 0)
    expect(arrayFactorPower(weights, { spacing: 0.5 }, 30)).toBeCloseTo(0.5, 12)
    const figures = beamFigures(weights, { spacing: 0.5 })
    expect(figures.halfPowerWidthDeg).toBeCloseTo(60, 6)
    expect(figures.sidelobeDb).toBeNull()
    // Element power pattern cos θ halves the power at 60°.
    expect(arrayFactorPower(weights, { spacing: 0.5, elementExponent: 1 }, 60) / arrayFactorPower(weights, { spacing: 0.5 }, 60)).toBeCloseTo(0.5, 12)
    const pattern = arrayPatternDb(weights, { spacing: 0.5 }, [0, 90])
    expect(pattern[0]).toBeCloseTo(0, 12)
    expect(pattern[1]).toBeLessThan(-200)
  })

  it('neighbouring orthogonal beams of a 4-element array cross at 20·log10(1/(4 sin(π/8))) = −3.70 dB', () => {
    // Derived by hand: beams 1/N apart in d·sin θ cross half-way, where |sin(Nπu)/(N sin(πu))| with u = 1/(2N).
    const expected = 20 * Math.log10(1 / (4 * Math.sin(Math.PI / 8)))
    const a = progressive(4, -45), b = progressive(4, 45)
    const level = crossoverDb(
      { weights: a, peakDeg: beamFigures(a, { spacing: 0.5 }).peakDeg },
      { weights: b, peakDeg: beamFigures(b, { spacing: 0.5 }).peakDeg },
      { spacing: 0.5 },
    )
    expect(level).toBeCloseTo(expected, 6)
    expect(() => beamFigures({ re: new Float64Array(3), im: new Float64Array(3) }, { spacing: 0.5 })).toThrow(/no power/)
  })

  it('the 4×4 beamforming matrix example steers inputs 1–4 (outputs are ports 5–8) to ±14.48° and ±48.59°', () => {
    const data = solveAt(butlerMatrix4x4, [2.45e9])
    const peaks = [1, 2, 3, 4].map(input => beamFigures(beamWeights(data, 0, input, [5, 6, 7, 8]), { spacing: 0.5 }))
    // Progressive phases −45°, +135°, −135°, +45° (the example's own description) steer as derived above.
    const expected = [-45, 135, -135, 45].map(beta => deg(Math.asin(-beta / 180)))
    peaks.forEach((figures, i) => {
      expect(figures.peakDeg).toBeCloseTo(expected[i]!, 4)
      expect(figures.peakDb).toBeCloseTo(0, 6)
    })
  })
})

describe('one-dimensional searches', () => {
  it('golden-section finds a maximum, including one on an end; bisection finds a root', () => {
    expect(goldenSectionMax(x => -((x - 0.3) ** 2), 0, 1)).toBeCloseTo(0.3, 7)
    expect(goldenSectionMax(x => x, 0, 1)).toBe(1)
    expect(bisectRoot(x => x * x - 2, 0, 2)).toBeCloseTo(Math.SQRT2, 9)
  })
})
