import { finishDesign } from '../design/document-parts'
import { butlerMatrix4x4 } from '../examples/butler-matrix-4x4'
import type { SpecCondition } from '../rf/spec-mask'
import { ARM_TOLERANCE, TEMPLATE_FREQUENCY, TEMPLATE_IMPEDANCE } from './common'
import { renameBlocks } from './rename-blocks'
import type { NetworkTemplate } from './types'

const INPUTS = [1, 2, 3, 4]
const OUTPUTS = [5, 6, 7, 8]
/**
 * Phase of S(n, i) − S(n+1, i) for input i of the matrix: steps of 45°, 135°, −135°, −45° across the
 * outputs. Derived by hand: each input meets the ranks of quadrature hybrids (−90° through the coupled
 * arm) and the 45° lines differently, which spreads the four inputs over the four steps.
 */
const STEP_DEG: Record<number, number> = { 1: 45, 2: -135, 3: 135, 4: -45 }

/** Our own block ids, given by type and order so they do not depend on the example's names. */
function templateIds(): Map<string, string> {
  const names = new Map<string, string>()
  let hybrids = 0, lines = 0
  for (const block of butlerMatrix4x4.blocks) {
    if (block.type === 'port') names.set(block.id, `Pt${block.params.index}`)
    else if (block.type === 'hybrid90') names.set(block.id, `Hy${++hybrids}`)
    else if (block.type === 'line') names.set(block.id, `Dl${++lines}`)
  }
  return names
}

/** Four inputs, four outputs feeding a half-wave-spaced line of four elements: one beam per input. */
export const beamMatrix4x4: NetworkTemplate = {
  slug: 'beam-matrix-4x4',
  name: '4×4 beamforming matrix',
  description: 'Eight quadrature hybrids and delay lines: each input steers its own beam of a 4-element array.',
  tags: ['beamforming', 'matrix', 'array feed'],
  ports: [...INPUTS.map(index => ({ index, role: `beam ${index}` })), ...OUTPUTS.map(index => ({ index, role: `element ${index - 4}` }))],
  array: { inputs: INPUTS, outputs: OUTPUTS, spacing: 0.5 },
  build() {
    const renamed = renameBlocks(butlerMatrix4x4, templateIds())
    const conditions: SpecCondition[] = [
      ...INPUTS.map((port): SpecCondition => ({ measure: 'returnLoss', port, min: 20 })),
      { measure: 'isolation', from: 1, to: 2, min: 20 },
      { measure: 'isolation', from: 3, to: 4, min: 20 },
      ...INPUTS.flatMap((from): SpecCondition[] => [
        { measure: 'insertionLoss', from, to: 5, min: 5.5, max: 6.6 },
        { measure: 'amplitudeImbalance', from, to: [5, 8], max: 1 },
        { measure: 'phaseDifference', from, to: [5, 6], target: STEP_DEG[from]!, tolerance: 10 },
        { measure: 'phaseDifference', from, to: [7, 8], target: STEP_DEG[from]!, tolerance: 10 },
      ]),
    ]
    const document = finishDesign({
      name: 'Quillmere 4×4 beamforming matrix, 2.45 GHz',
      frequency: TEMPLATE_FREQUENCY,
      impedance: TEMPLATE_IMPEDANCE,
      blocks: renamed.blocks,
      wires: renamed.wires,
      span: 0.2,
      conditions,
    })
    const lines = renamed.blocks.filter(b => b.type === 'line').map(b => b.id)
    return { ...document, tolerances: Object.fromEntries(lines.map(id => [`${id}.impedance`, ARM_TOLERANCE])) }
  },
}
