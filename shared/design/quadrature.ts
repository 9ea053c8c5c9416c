import type { SpecCondition } from '../rf/spec-mask'
import type { BlockSpec, NetworkDocument, Wire } from '../network/types'
import { branchLineSections } from './branch-line-sections'
import { finishDesign, frequencyText, lineBlock, portBlock, STEP, tidy, timesZ0 } from './document-parts'
import type { QuadratureAsk } from './types'

/** Equal split: 10·log10(2) dB to the coupled port. */
export const EQUAL_SPLIT_DB = 10 * Math.log10(2)

/**
 * Branch-line quadrature hybrid of one, two or three sections (ports 1 in, 2 through,
 * 3 coupled, 4 isolated), drawn as two rows of series arms joined by vertical branches.
 */
export function designQuadrature(ask: QuadratureAsk): NetworkDocument {
  const couplingDb = ask.couplingDb ?? EQUAL_SPLIT_DB
  const sections = ask.sections ?? 1
  const c = 10 ** (-couplingDb / 20)
  const arms = branchLineSections(c, sections)
  const blocks: BlockSpec[] = [
    portBlock('Pt1', 1, 0, 0),
    portBlock('Pt4', 4, 0, 2 * STEP),
    portBlock('Pt2', 2, 2 * STEP * (sections + 1), 0, true),
    portBlock('Pt3', 3, 2 * STEP * (sections + 1), 2 * STEP, true),
  ]
  const wires: Wire[] = []
  // Junction k on the 1–2 row and on the 4–3 row: where branch k meets the series arms.
  const top = (k: number) => (k === 0 ? 'Pt1.1' : k === sections ? 'Pt2.1' : `Ln${k}.2`)
  const bottom = (k: number) => (k === 0 ? 'Pt4.1' : k === sections ? 'Pt3.1' : `Lr${k}.2`)
  arms.branches.forEach((z, k) => {
    blocks.push(lineBlock(`Br${k + 1}`, timesZ0(z), STEP + 2 * STEP * k, STEP - 20, { rotation: 90 }))
    wires.push([top(k), `Br${k + 1}.1`], [`Br${k + 1}.2`, bottom(k)])
  })
  arms.series.forEach((z, i) => {
    blocks.push(lineBlock(`Ln${i + 1}`, timesZ0(z), 2 * STEP * (i + 1), 0), lineBlock(`Lr${i + 1}`, timesZ0(z), 2 * STEP * (i + 1), 2 * STEP))
    wires.push([top(i), `Ln${i + 1}.1`], [bottom(i), `Lr${i + 1}.1`])
    if (i === sections - 1) wires.push([`Ln${i + 1}.2`, 'Pt2.1'], [`Lr${i + 1}.2`, 'Pt3.1'])
  })
  const equal = Math.abs(couplingDb - EQUAL_SPLIT_DB) < 1e-6
  const throughDb = -10 * Math.log10(1 - c * c)
  const split: SpecCondition[] = equal
    ? [{ measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.5 }]
    : [
        { measure: 'insertionLoss', from: 1, to: 2, min: tidy(throughDb - 0.5), max: tidy(throughDb + 0.5) },
        { measure: 'coupling', from: 1, to: 3, min: tidy(couplingDb - 0.5), max: tidy(couplingDb + 0.5) },
      ]
  const conditions: SpecCondition[] = [
    { measure: 'returnLoss', port: 1, min: 20 },
    { measure: 'isolation', from: 1, to: 4, min: 20 },
    ...split,
    { measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 5 },
  ]
  return finishDesign({
    name: `Quadrature hybrid, ${tidy(couplingDb).toFixed(2)} dB, ${sections} section${sections > 1 ? 's' : ''}, ${frequencyText(ask.frequency)}`,
    frequency: ask.frequency,
    impedance: ask.impedance,
    blocks,
    wires,
    span: sections === 1 ? 0.5 : 0.6,
    conditions,
  })
}
