import type { MicrostripSubstrate } from '../microstrip/types'
import type { BlockSpec, NetworkDocument } from '../network/types'
import { branchLineCentre } from './branch-line-centre'
import { branchLineWithTees } from './branch-line-tees'
import { tidy } from './document-parts'
import { inMicrostrip } from './microstrip-medium'
import { designQuadrature } from './quadrature'

/** What the junctions of a one-section microstrip branch-line do to its centre frequency. */
export interface JunctionStudy {
  /** Centre (Hz) of the design as placed: strips λg/4 long between junction centres, joined at ideal nodes. */
  placedCentre: number
  /** Centre (Hz) once each strip ends at the edges of the strips it meets and width steps carry their parasitics. */
  etchedCentre: number
  /** (etched − placed)/f0, in per cent. */
  shiftPercent: number
  /** Factor on every etched strip length that centres the etched hybrid on f0 again, and the centre it gives. */
  compensationScale: number
  compensatedCentre: number
  /** Widths (m) of the through arms (Z0/√2) and of the branches and ports (Z0). */
  throughWidth: number
  branchWidth: number
  /** Centre (Hz) with a `microstripTee` at each junction (and steps to the ports), arms as placed. */
  teeCentre: number
  /** (tee − placed)/f0, in per cent. */
  teeShiftPercent: number
  /** Length (m) the tee compensation adds to each branch and to each through arm (both ends' shifts at f0). */
  teeAddedBranch: number
  teeAddedThrough: number
  /** Centre (Hz) with the tee shifts added to the arms and no further scale. */
  teeShiftedCentre: number
  /** Factor on the lengthened arms that centres the tee design on f0, and the centre it gives. */
  teeScale: number
  teeCompensatedCentre: number
}

const mm = (text: unknown) => Number(String(text).replace(' mm', '')) * 1e-3

/**
 * The one-section branch-line in microstrip twice over: as the assistant places it (each arm λg/4
 * between junction centres, junctions ideal nodes) and as etched: each strip shortened by half the
 * width of the strip it meets at either end (reference planes at the strip edges, common practice),
 * and the step from a Z0 strip into the wider Z0/√2 arm modelled at each junction with the step
 * parasitics of Gupta, Garg, Bahl & Bhartia (Microstrip Lines and Slotlines, 2nd ed., 1996, §3.4)
 * [memory]. Third, with the tee model: a `microstripTee` at every junction (Hammerstad 1981 [memory]),
 * arms as placed, and the compensation the quadrature assistant applies (`branchLineWithTees`).
 * Every figure is measured with the solver.
 */
export function branchLineJunctionStudy(substrate: MicrostripSubstrate, f0: number, impedance = 50): JunctionStudy {
  const placed = inMicrostrip(designQuadrature({ frequency: f0, impedance }), substrate, f0)
  const through = placed.blocks.find(b => b.id === 'Ln1')!, branch = placed.blocks.find(b => b.id === 'Br1')!
  const throughWidth = mm(through.params.width), branchWidth = mm(branch.params.width)
  const etched = (scale: number): NetworkDocument => {
    const doc = structuredClone(placed)
    for (const block of doc.blocks) {
      if (block.type !== 'microstrip') continue
      const crossing = block.id.startsWith('Br') ? throughWidth : branchWidth
      block.params.length = `${tidy((mm(block.params.length) - crossing) * scale * 1e3)} mm`
    }
    // A step from the junction (Z0 width) into each through arm, at both of its ends.
    const steps: BlockSpec[] = []
    const into: NetworkDocument['wires'] = []
    doc.wires = doc.wires.map(([a, b]) => {
      const arm = [a, b].find(end => /^L[nr]\d\.[12]$/.test(end))
      if (!arm) return [a, b]
      const other = arm === a ? b : a
      const id = `Js${steps.length + 1}`
      steps.push({ id, type: 'microstripStep', params: { substrate: 'board', width1: `${tidy(branchWidth * 1e3)} mm`, width2: `${tidy(throughWidth * 1e3)} mm` } })
      into.push([`${id}.2`, arm])
      return [other, `${id}.1`]
    })
    doc.blocks.push(...steps)
    doc.wires.push(...into)
    return doc
  }
  const placedCentre = branchLineCentre(placed, f0)
  const etchedCentre = branchLineCentre(etched(1), f0)
  // Bisection on the length factor: a longer strip moves the centre down.
  let lo = 0.8, hi = 1.25
  for (let i = 0; i < 40; i++) {
    const mid = 0.5 * (lo + hi)
    if (branchLineCentre(etched(mid), f0, 0.1, 401) > f0) lo = mid
    else hi = mid
  }
  const compensationScale = 0.5 * (lo + hi)
  const withTees = branchLineWithTees(placed, substrate, f0, impedance, false)
  const compensated = branchLineWithTees(placed, substrate, f0, impedance, true)
  return {
    teeCentre: withTees.centre,
    teeShiftPercent: (100 * (withTees.centre - placedCentre)) / f0,
    teeAddedBranch: compensated.added.Br1 ?? 0,
    teeAddedThrough: compensated.added.Ln1 ?? 0,
    teeShiftedCentre: compensated.shiftedCentre!,
    teeScale: compensated.scale,
    teeCompensatedCentre: branchLineCentre(compensated.document, f0),
    placedCentre, etchedCentre, shiftPercent: (100 * (etchedCentre - placedCentre)) / f0,
    compensationScale, compensatedCentre: branchLineCentre(etched(compensationScale), f0), throughWidth, branchWidth,
  }
}
