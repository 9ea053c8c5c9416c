import { analyseMicrostrip } from '../microstrip/analyse-microstrip'
import { teeJunction } from '../microstrip/tee-junction'
import type { MicrostripSubstrate } from '../microstrip/types'
import type { BlockSpec, NetworkDocument, Wire } from '../network/types'
import { branchLineCentre } from './branch-line-centre'
import { matchedBandCentre } from './matched-band-centre'
import { specBandCentre } from './spec-band-centre'
import { tidy } from './document-parts'
import { DESIGN_SUBSTRATE, stripFor } from './microstrip-medium'

const mm = (text: unknown) => Number(String(text).replace(' mm', '')) * 1e-3
const mmText = (metres: number) => `${tidy(metres * 1e3)} mm`
const SERIES = /^L[nr]\d+$/
const LEFT_PORTS = new Set(['Pt1', 'Pt4'])

/** How a microstrip branch-line's junctions are drawn: the tees placed, and the arms lengthened to match. */
export interface BranchLineTees {
  document: NetworkDocument
  /** Length added to each arm (m), by block id: the tee shifts d1 or d2 of both its ends at f0. */
  added: Record<string, number>
  /** Factor on every arm's (lengthened) length that puts the centre on f0 (1 without `compensate`). */
  scale: number
  /** Where the drawn design centres (Hz): by `junctionCentre`, or with `compensate` by the measure the factor aims at. */
  centre: number
  /** With `compensate`: where it centres with the tee shifts added and no scale yet. */
  shiftedCentre?: number
}

/**
 * Centre (Hz) of a branch-line: for one section where |S11|² + |S41|² is least (`branchLineCentre`);
 * for more, the middle of the band where both |S11| and |S41| stay below −20 dB, whose several
 * minima make the least point jump.
 */
export function junctionCentre(document: NetworkDocument, f0: number): number {
  const sections = document.blocks.filter(b => /^Br\d+$/.test(b.id)).length - 1
  return sections <= 1 ? branchLineCentre(document, f0, 0.15, 601) : matchedBandCentre(document, f0, 0.6, 801)
}

/** Where the compensation aims: one section by `junctionCentre`; more by the middle of the band meeting the spec, else `junctionCentre`. */
function aimCentre(document: NetworkDocument, f0: number): number {
  const sections = document.blocks.filter(b => /^Br\d+$/.test(b.id)).length - 1
  return (sections > 1 ? specBandCentre(document, f0, 0.6, 801) : undefined) ?? junctionCentre(document, f0)
}

/**
 * A microstrip branch-line (as `inMicrostrip` draws the quadrature assistant's design) with a
 * `microstripTee` at every junction: the main line along the row of series arms, the branch arm at
 * terminal 3, and a `microstripStep` where a port's Z0 strip meets a wider or narrower main line.
 * With `compensate`, each arm is lengthened by the reference-plane shifts of the tees at its ends at
 * f0 (d1 for series arms, d2 for branches; Hammerstad 1981 [memory]), so that each arm is again its
 * electrical length between the tees' reference planes, and then every arm is scaled by one factor
 * (a fixed-point iteration on the solved centre, s ← s·f_c/f0) for what the node susceptance, the
 * turns ratio and the steps still move. Layout: tees at the junctions, ports moved out for the steps.
 */
export function branchLineWithTees(placed: NetworkDocument, substrate: MicrostripSubstrate, f0: number, impedance: number, compensate: boolean): BranchLineTees {
  const doc: NetworkDocument = structuredClone(placed)
  const byId = new Map(doc.blocks.map(b => [b.id, b]))
  const widthOf = (id: string) => mm(byId.get(id)!.params.width)
  const portStrip = stripFor(substrate, impedance, 90, f0)
  if ('message' in portStrip) throw new Error(`the ports' ${tidy(impedance)} Ω strip: ${portStrip.message}`)
  const portWidth = portStrip.width

  // Nets: terminals joined through wires.
  const parent = new Map<string, string>()
  const find = (t: string): string => { const p = parent.get(t) ?? t; if (p === t) return t; const root = find(p); parent.set(t, root); return root }
  for (const [a, b] of doc.wires) parent.set(find(a), find(b))
  const nets = new Map<string, string[]>()
  for (const t of new Set(doc.wires.flat())) {
    const root = find(t)
    nets.set(root, [...(nets.get(root) ?? []), t])
  }

  const blocks: BlockSpec[] = []
  const wires: Wire[] = []
  const shiftAt: Record<string, number> = {}
  const addShift = (id: string, metres: number) => { shiftAt[id] = (shiftAt[id] ?? 0) + metres }
  let teeCount = 0, stepCount = 0
  const kept = new Set<string>()
  for (const terminals of nets.values()) {
    const branchEnd = terminals.find(t => t.startsWith('Br'))
    if (!branchEnd) continue
    const sides = terminals.filter(t => t !== branchEnd)
    const isLeft = (t: string) => LEFT_PORTS.has(t.split('.')[0]!) || (SERIES.test(t.split('.')[0]!) && t.endsWith('.2'))
    const left = sides.find(isLeft), right = sides.find(t => !isLeft(t))
    if (!left || !right || sides.length !== 2) throw new Error('the junctions of this design are not those of a branch-line')
    for (const t of terminals) kept.add(t)
    const armOf = (t: string) => (SERIES.test(t.split('.')[0]!) ? t.split('.')[0]! : undefined)
    const mainArm = armOf(right) ?? armOf(left)!
    const mainWidth = widthOf(mainArm)
    const branchArm = branchEnd.split('.')[0]!
    const branchWidth = widthOf(branchArm)
    const id = `Tj${++teeCount}`
    const branchBlock = byId.get(branchArm)!
    const top = branchEnd.endsWith('.1')
    // Above the top row and below the bottom row, over the branch (the rows are 240 px apart).
    const x = branchBlock.layout!.x - 20, y = top ? -100 : 300
    blocks.push({ id, type: 'microstripTee', params: { substrate: DESIGN_SUBSTRATE, mainWidth: mmText(mainWidth), branchWidth: mmText(branchWidth) }, layout: top ? { x, y } : { x, y, rotation: 180 } })
    const main = analyseMicrostrip(substrate, mainWidth, f0), branch = analyseMicrostrip(substrate, branchWidth, f0)
    const tee = teeJunction(main, branch, substrate.height, substrate.permittivity, f0)
    addShift(branchArm, tee.branchShift)
    // A side that is not the main arm's width meets the tee through a step.
    const join = (end: string, teeTerminal: string) => {
      const arm = armOf(end)
      const width = arm ? widthOf(arm) : portWidth
      if (arm) addShift(arm, tee.mainShift)
      if (Math.abs(width / mainWidth - 1) < 1e-9) { wires.push([end, teeTerminal]); return }
      const step = `Js${++stepCount}`
      const port = byId.get(end.split('.')[0]!)!
      // Beside its port, or (between two arms of unlike width) beyond the tee, away from the rows.
      const layout = arm
        ? { x: x - 100, y: top ? -200 : 400 }
        : { x: port.layout!.x + (isLeft(end) ? -140 : 100), y: port.layout!.y, ...(isLeft(end) ? {} : { rotation: 180 as const }) }
      blocks.push({ id: step, type: 'microstripStep', params: { substrate: DESIGN_SUBSTRATE, width1: mmText(width), width2: mmText(mainWidth) }, layout })
      wires.push([end, `${step}.1`], [`${step}.2`, teeTerminal])
    }
    join(left, `${id}.${top ? 1 : 2}`)
    join(right, `${id}.${top ? 2 : 1}`)
    wires.push([branchEnd, `${id}.3`])
  }
  doc.wires = [...doc.wires.filter(([a, b]) => !kept.has(a) && !kept.has(b)), ...wires]
  // Ports move out by two positions to leave room for the steps beside them.
  for (const block of doc.blocks) {
    if (block.type !== 'port' || !block.layout) continue
    block.layout = { ...block.layout, x: block.layout.x + (LEFT_PORTS.has(block.id) ? -240 : 240) }
  }
  doc.blocks.push(...blocks)
  const added: Record<string, number> = {}
  if (!compensate) return { document: doc, added, scale: 1, centre: junctionCentre(doc, f0) }
  const base = new Map<string, number>()
  for (const block of doc.blocks) {
    if (block.type !== 'microstrip') continue
    const shift = shiftAt[block.id] ?? 0
    base.set(block.id, mm(block.params.length) + shift)
    if (shift) added[block.id] = shift
  }
  const scaled = (scale: number) => {
    for (const block of doc.blocks) if (base.has(block.id)) block.params.length = mmText(base.get(block.id)! * scale)
    return aimCentre(doc, f0)
  }
  let scale = 1, centre = scaled(scale)
  const shiftedCentre = centre
  for (let i = 0; i < 6 && Math.abs(centre / f0 - 1) > 2e-5; i++) {
    scale *= centre / f0
    centre = scaled(scale)
  }
  return { document: doc, added, scale, centre, shiftedCentre }
}
