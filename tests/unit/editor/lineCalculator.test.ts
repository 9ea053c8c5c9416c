import { describe, expect, it } from 'vitest'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import { calculateLine, type LineCalculatorInputs } from '../../../app/utils/editor/lineCalculator'
import { lineFigures } from '../../../shared/microstrip/line-figures'

const base: LineCalculatorInputs = { substrate: 'board', mode: 'synthesise', width: '', impedance: '50', frequency: '2.5 GHz', degrees: '90' }

describe('line calculator', () => {
  // Pozar, Microwave Engineering, 4th ed., Example 3.7 [memory]: εr = 2.20, d = 0.127 cm, 50 Ω, 90° at 2.5 GHz → W = 0.391 cm, l = 2.19 cm.
  const doc = { ...emptyDocument('t'), variables: { er: 2.2, Z0: '50 ohm' }, substrates: { board: { permittivity: 'er', height: '0.127 cm' } } }

  it('gives the same figures as the line command\'s shared function, reading variables', () => {
    const result = calculateLine(doc, { ...base, impedance: 'Z0' })
    expect(result.errors).toEqual({})
    const expected = lineFigures({ permittivity: 2.2, height: 1.27e-3, thickness: 0, lossTangent: 0, roughness: 0 }, { impedance: 50, frequency: 2.5e9, degrees: 90 })
    expect(expected.ok && result.figures).toEqual(expected.ok && expected.figures)
    expect(Math.abs(result.figures!.width / 0.00391 - 1)).toBeLessThan(0.005)
    expect(Math.abs(result.figures!.length! / 0.0219 - 1)).toBeLessThan(0.01)
  })

  it('analyses a width, statically when no frequency is given', () => {
    const result = calculateLine(doc, { ...base, mode: 'analyse', width: '3.9156 mm', frequency: '', degrees: '' })
    expect(result.figures?.impedance).toBeCloseTo(50, 2)
    expect(result.figures?.wavelength).toBeUndefined()
  })

  it('names each wrong field', () => {
    expect(calculateLine(doc, { ...base, substrate: 'none', impedance: '3 GHz', frequency: '', degrees: '90' }).errors).toEqual({
      substrate: 'choose a substrate (add one above)',
      impedance: expect.stringMatching(/is a frequency/),
      frequency: 'is needed for a length in degrees',
    })
    expect(calculateLine(doc, { ...base, impedance: '900' }).errors.impedance).toMatch(/no strip width/)
  })
})
