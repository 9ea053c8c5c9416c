import { describe, expect, it } from 'vitest'
import { branchLineCentre, branchLineJunctionStudy, branchLineWithTees, designQuadrature, inMicrostrip, runDesign, specBandCentre } from '../../../shared/design/index'
import { analyseMicrostrip } from '../../../shared/microstrip/analyse-microstrip'
import { teeJunction } from '../../../shared/microstrip/tee-junction'
import { expectMeetsOwnSpec, expectNoOverlap, expectOwnIds, solveDesign } from './helpers'

// An invented demo board (the Quillmere QL-350 0.508 mm of the seed).
const demoBoard = { permittivity: 3.5, height: 0.508e-3, thickness: 35e-6, lossTangent: 0, roughness: 0 }
const f0 = 2.45e9
const mm = (text: unknown) => Number(String(text).replace(' mm', '')) * 1e-3
const inMicrostripOptions = { 'frequency': '2.45 GHz', 'impedance': '50', 'substrate-permittivity': '3.5', 'substrate-height': '0.508 mm', 'substrate-thickness': '35 um' }

describe('branch-line with tee junctions', () => {
  it('centres between the placed and etched bounds on the QL-350 demo board: README figures, computed by the solver', () => {
    const study = branchLineJunctionStudy(demoBoard, f0)
    // README "Junctions of the microstrip branch-line", tee rows: +5.44 %, arms +1.682 / +0.179 mm, factor 1.0083.
    expect(study.teeShiftPercent).toBeCloseTo(5.44, 2)
    expect(study.teeShiftPercent).toBeGreaterThan(0)
    expect(study.teeShiftPercent).toBeLessThan(study.shiftPercent)
    expect(study.teeAddedBranch * 1e3).toBeCloseTo(1.682, 3)
    expect(study.teeAddedThrough * 1e3).toBeCloseTo(0.179, 3)
    expect(study.teeShiftedCentre / f0 - 1).toBeCloseTo(0.00866, 5)
    expect(study.teeScale).toBeCloseTo(1.0083, 4)
    expect(Math.abs(study.teeCompensatedCentre / f0 - 1)).toBeLessThan(1e-4)
  })

  it('lengthens each arm by the shifts of the tees at both its ends (d2 for branches, d1 for through arms) before the common factor', () => {
    const placed = inMicrostrip(designQuadrature({ frequency: f0, impedance: 50 }), demoBoard, f0)
    const drawn = branchLineWithTees(placed, demoBoard, f0, 50, true)
    const width = (id: string) => mm(placed.blocks.find(b => b.id === id)!.params.width)
    const tee = teeJunction(analyseMicrostrip(demoBoard, width('Ln1'), f0), analyseMicrostrip(demoBoard, width('Br1'), f0), demoBoard.height, demoBoard.permittivity, f0)
    // derived by hand: two ends, each shifted by the tee's d at f0.
    expect(drawn.added.Br1).toBeCloseTo(2 * tee.branchShift, 12)
    expect(drawn.added.Ln1).toBeCloseTo(2 * tee.mainShift, 12)
    const length = (doc: typeof placed, id: string) => mm(doc.blocks.find(b => b.id === id)!.params.length)
    expect(length(drawn.document, 'Br1') / ((length(placed, 'Br1') + drawn.added.Br1!) * drawn.scale)).toBeCloseTo(1, 8)
  })

  it('the quadrature assistant in microstrip places tees by default and its full solve centres within 0.5 % of f0', () => {
    const designed = runDesign('quadrature', inMicrostripOptions)
    if (!designed.ok) throw new Error(JSON.stringify(designed.problems))
    const doc = designed.document
    expect(doc.blocks.filter(b => b.type === 'microstripTee')).toHaveLength(4)
    expect(doc.blocks.filter(b => b.type === 'microstripStep')).toHaveLength(4)
    expect(Math.abs(branchLineCentre(doc, f0, 0.2, 2001) / f0 - 1)).toBeLessThan(0.005)
    expectOwnIds(doc)
    expectNoOverlap(doc)
    expectMeetsOwnSpec(doc, solveDesign(doc, 2001))
    // The spec band is the solved one: 10 % for one section (README "Design assistants in microstrip").
    expect(doc.spec?.band).toEqual({ start: '0.95 * f0', stop: '1.05 * f0' })
  })

  it('centres two- and three-section designs on f0 too (the band meeting the spec has its middle at f0) and keeps their spec bands', () => {
    // The ideal designs' spec bands: 22 % and 27 % (README "Design assistants").
    for (const [sections, band] of [['2', 0.22], ['3', 0.27]] as const) {
      const designed = runDesign('quadrature', { ...inMicrostripOptions, sections })
      if (!designed.ok) throw new Error(JSON.stringify(designed.problems))
      const doc = designed.document
      expect(doc.blocks.filter(b => b.type === 'microstripTee')).toHaveLength(2 * (Number(sections) + 1))
      expect(Math.abs(specBandCentre(doc, f0)! / f0 - 1), `${sections} sections`).toBeLessThan(0.005)
      const start = Number(String(doc.spec!.band!.start).split(' ')[0]), stop = Number(String(doc.spec!.band!.stop).split(' ')[0])
      expect(stop - start).toBeGreaterThanOrEqual(band)
      expectNoOverlap(doc)
      expectMeetsOwnSpec(doc, solveDesign(doc, 2001))
    }
  })

  it('keeps ideal nodes with --substrate-junctions ideal, and refuses another word', () => {
    const ideal = runDesign('quadrature', { ...inMicrostripOptions, 'substrate-junctions': 'ideal' })
    expect(ideal.ok && ideal.document.blocks.some(b => b.type === 'microstripTee')).toBe(false)
    expect(ideal.ok && Math.abs(branchLineCentre(ideal.document, f0) / f0 - 1)).toBeLessThan(1e-4)
    const wrong = runDesign('quadrature', { ...inMicrostripOptions, 'substrate-junctions': 'cross' })
    expect(wrong.ok ? [] : wrong.problems).toEqual([{ option: 'substrate-junctions', message: 'must be tee or ideal (got "cross")' }])
  })
})
