import { describe, expect, it } from 'vitest'
import { coupledLineModes, runDesign } from '../../../shared/design/index'
import { coupledStripsFor } from '../../../shared/design/coupled-microstrip'
import { coupledMicrostripStatic } from '../../../shared/microstrip/coupled-static'
import { entry, nearest, solveDesign } from './helpers'

const demoBoard = { permittivity: 3.5, height: 0.508e-3, thickness: 0, lossTangent: 0, roughness: 0 }
const db = (x: [number, number]) => 20 * Math.log10(Math.hypot(x[0], x[1]))

describe('coupled-line assistant in microstrip', () => {
  it('finds the width and gap whose modes are the asked Ze and Zo (Pozar, 4th ed., §7.6: Ze·Zo = Z0²)', () => {
    const c = 10 ** (-15 / 20), modes = coupledLineModes(c)
    const strips = coupledStripsFor(demoBoard, 50 * modes.even, 50 * modes.odd)
    if ('message' in strips) throw new Error(strips.message)
    const m = coupledMicrostripStatic(strips.width / demoBoard.height, strips.gap / demoBoard.height, 3.5)
    expect(m.evenImpedance / (50 * modes.even)).toBeCloseTo(1, 9)
    expect(m.oddImpedance / (50 * modes.odd)).toBeCloseTo(1, 9)
  })

  it('places a coupledMicrostrip block that couples as asked at f0 on the QL-350 demo board', () => {
    for (const couplingDb of [10, 20]) {
      const designed = runDesign('coupled-line', { 'frequency': '2.45 GHz', 'impedance': '50', 'coupling-db': String(couplingDb), 'substrate-permittivity': '3.5', 'substrate-height': '0.508 mm' })
      if (!designed.ok) throw new Error(JSON.stringify(designed.problems))
      expect(designed.document.blocks.map(b => b.type)).toContain('coupledMicrostrip')
      const r = solveDesign(designed.document, 801)
      const k = nearest(r, 2.45e9)
      // Quarter wave for the mean of the modes: coupling within 0.2 dB of the ask at f0.
      expect(Math.abs(db(entry(r, 3, 1, k)) + couplingDb)).toBeLessThan(0.2)
      expect(db(entry(r, 1, 1, k))).toBeLessThan(-20)
    }
  })
})
