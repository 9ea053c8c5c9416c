import { designDivider } from '../design/divider'
import { finishDesign, portBlock, STEP } from '../design/document-parts'
import type { SpecCondition } from '../rf/spec-mask'
import type { BlockSpec, Wire } from '../network/types'
import { ARM_TOLERANCE, TEMPLATE_FREQUENCY, TEMPLATE_IMPEDANCE } from './common'
import type { NetworkTemplate } from './types'

// Each stage is the divider assistant's equal split; its ports become the junctions named here.
const STAGES = [
  { prefix: 'Fa', dx: 0, dy: 3 * STEP, input: 'Pt1.1', outputs: ['FaAr2.2', 'FaAr3.2'] },
  { prefix: 'Gb', dx: 4 * STEP, dy: STEP, input: 'FaAr2.2', outputs: ['Pt2.1', 'Pt3.1'] },
  { prefix: 'Gc', dx: 4 * STEP, dy: 5 * STEP, input: 'FaAr3.2', outputs: ['Pt4.1', 'Pt5.1'] },
] as const

/** Three equal in-phase dividers in two ranks: one input, four matched outputs of a quarter of the power each. */
export const corporateDivider: NetworkTemplate = {
  slug: 'corporate-divider-1x4',
  name: '1:4 corporate divider',
  description: 'Three in-phase dividers in two ranks: four equal, in-phase, matched and isolated outputs.',
  tags: ['divider', 'in-phase', 'array feed'],
  ports: [{ index: 1, role: 'in' }, ...[2, 3, 4, 5].map(index => ({ index, role: `output ${index - 1}` }))],
  build() {
    const blocks: BlockSpec[] = [portBlock('Pt1', 1, 0, 4 * STEP)]
    const wires: Wire[] = []
    for (const stage of STAGES) {
      const divider = designDivider({ frequency: TEMPLATE_FREQUENCY, impedance: TEMPLATE_IMPEDANCE })
      const terminal = (t: string) => t === 'Pt1.1' ? stage.input : t === 'Pt2.1' ? stage.outputs[0] : t === 'Pt3.1' ? stage.outputs[1] : `${stage.prefix}${t}`
      for (const block of divider.blocks) {
        if (block.type === 'port') continue
        blocks.push({ ...block, id: `${stage.prefix}${block.id}`, layout: { ...block.layout!, x: block.layout!.x + stage.dx, y: block.layout!.y + stage.dy } })
      }
      for (const [a, b] of divider.wires) {
        const wire: Wire = [terminal(a), terminal(b)]
        if (wire[0] !== wire[1]) wires.push(wire)
      }
    }
    blocks.push(...[2, 3, 4, 5].map(i => portBlock(`Pt${i}`, i, 9 * STEP, (2 * i - 4) * STEP, true)))
    const outputs = [2, 3, 4, 5]
    const quarterDb = 10 * Math.log10(4)
    const conditions: SpecCondition[] = [
      ...[1, ...outputs].map((port): SpecCondition => ({ measure: 'returnLoss', port, min: 20 })),
      ...outputs.map((to): SpecCondition => ({ measure: 'insertionLoss', from: 1, to, min: Number((quarterDb - 0.5).toFixed(2)), max: Number((quarterDb + 0.5).toFixed(2)) })),
      { measure: 'isolation', from: 2, to: 3, min: 20 },
      { measure: 'isolation', from: 4, to: 5, min: 20 },
      { measure: 'isolation', from: 3, to: 4, min: 20 },
      { measure: 'phaseDifference', from: 1, to: [2, 5], target: 0, tolerance: 5 },
    ]
    const document = finishDesign({ name: 'Quillmere 1:4 corporate divider, 2.45 GHz', frequency: TEMPLATE_FREQUENCY, impedance: TEMPLATE_IMPEDANCE, blocks, wires, span: 0.5, conditions })
    const arms = blocks.filter(b => b.type === 'line').map(b => b.id)
    return {
      ...document,
      tolerances: {
        ...Object.fromEntries(arms.map(id => [`${id}.impedance`, ARM_TOLERANCE])),
        ...Object.fromEntries(STAGES.map(s => [`${s.prefix}Rs1.resistance`, { relative: 0.05 }])),
      },
    }
  },
}
