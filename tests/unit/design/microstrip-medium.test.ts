import { describe, expect, it } from 'vitest'
import { branchLineCentre, branchLineJunctionStudy, designQuadrature, inMicrostrip, runDesign, stripFor } from '../../../shared/design/index'
import { entry, nearest, solveDesign } from './helpers'

// Pozar, Microwave Engineering, 4th ed., Example 3.7 [memory]: εr = 2.20, h = 0.127 cm, 50 Ω → W ≈ 0.391 cm,
// 90° at 2.5 GHz → l ≈ 2.19 cm (static formulas; ours include dispersion at f0, hence 2 %).
const pozarBoard = { permittivity: 2.2, height: 1.27e-3, thickness: 0, lossTangent: 0, roughness: 0 }
// An invented demo board (the Quillmere QL-350 0.508 mm of the seed).
const demoBoard = { permittivity: 3.5, height: 0.508e-3, thickness: 35e-6, lossTangent: 0, roughness: 0 }
const db = (x: [number, number]) => 20 * Math.log10(Math.hypot(x[0], x[1]))

describe('design assistants in microstrip', () => {
  it('sizes a strip as Pozar\'s Example 3.7 within 2 %', () => {
    const strip = stripFor(pozarBoard, 50, 90, 2.5e9)
    if ('message' in strip) throw new Error(strip.message)
    expect(strip.width / 3.91e-3).toBeGreaterThan(0.98)
    expect(strip.width / 3.91e-3).toBeLessThan(1.02)
    expect(strip.length / 2.19e-2).toBeGreaterThan(0.98)
    expect(strip.length / 2.19e-2).toBeLessThan(1.02)
  })

  it('places the branch-line as microstrips that are ideal at f0 on a lossless board (derived by hand: widths and lengths exact at f0, junctions ideal nodes)', () => {
    const doc = inMicrostrip(designQuadrature({ frequency: 2.45e9, impedance: 50 }), demoBoard, 2.45e9)
    expect(doc.blocks.filter(b => b.type === 'line')).toHaveLength(0)
    expect(doc.blocks.filter(b => b.type === 'microstrip')).toHaveLength(4)
    expect(doc.substrates?.board).toEqual({ permittivity: 3.5, height: '0.508 mm', thickness: '35 um' })
    const r = solveDesign(doc, 401)
    const k = nearest(r, 2.45e9)
    expect(db(entry(r, 1, 1, k))).toBeLessThan(-40)
    expect(db(entry(r, 4, 1, k))).toBeLessThan(-40)
    expect(db(entry(r, 2, 1, k))).toBeCloseTo(-3.0103, 2)
    expect(db(entry(r, 3, 1, k))).toBeCloseTo(-3.0103, 2)
    expect(doc.spec?.band).toBeDefined()
  })

  it('takes the substrate as options of the design command and names what is missing', () => {
    const ok = runDesign('ring', { 'frequency': '2.45 GHz', 'impedance': '50', 'substrate-permittivity': '3.5', 'substrate-height': '0.508 mm' })
    expect(ok.ok && ok.document.blocks.filter(b => b.type === 'microstrip')).toHaveLength(4)
    const half = runDesign('divider', { 'frequency': '2.45 GHz', 'impedance': '50', 'substrate-height': '0.508 mm' })
    expect(half.ok ? [] : half.problems).toEqual([{ option: 'substrate-permittivity', message: 'is required for a design in microstrip (with --substrate-height)' }])
    const coupled = runDesign('coupled-line', { 'frequency': '2.45 GHz', 'impedance': '50', 'coupling-db': '10', 'substrate-permittivity': '3.5' })
    expect(coupled.ok).toBe(false)
    const thin = runDesign('transformer', { 'frequency': '1 GHz', 'impedance': '50', 'load': '5000', 'sections': '1', 'response': 'binomial', 'substrate-permittivity': '3.5', 'substrate-height': '0.508 mm' })
    expect(thin.ok ? '' : thin.problems[0]!.message).toMatch(/this board cannot carry the design: arm Qw1 \(500 Ω\): no strip width/)
  })

  it('measures the junction shift on the QL-350 demo board: README figures, computed by the solver', () => {
    const study = branchLineJunctionStudy(demoBoard, 2.45e9)
    expect(Math.abs(study.placedCentre / 2.45e9 - 1)).toBeLessThan(1e-4)
    // README "Junctions of the microstrip branch-line": +8.20 % and a length factor 1.0823.
    expect(study.shiftPercent).toBeCloseTo(8.20, 2)
    expect(study.compensationScale).toBeCloseTo(1.0823, 4)
    expect(Math.abs(study.compensatedCentre / 2.45e9 - 1)).toBeLessThan(1e-4)
  })

  it('finds the centre of the ideal branch-line at f0 and of a shortened one above it', () => {
    const doc = designQuadrature({ frequency: 2e9, impedance: 50 })
    expect(Math.abs(branchLineCentre(doc, 2e9) / 2e9 - 1)).toBeLessThan(1e-6)
    for (const b of doc.blocks) if (b.type === 'line') b.params.degrees = 81
    // derived by hand: every arm 90° at the new centre → 2 GHz · 90/81.
    expect(branchLineCentre(doc, 2e9) / (2e9 * 90 / 81)).toBeCloseTo(1, 5)
  })
})
