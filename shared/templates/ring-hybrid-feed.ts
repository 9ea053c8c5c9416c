import { designRing } from '../design/ring'
import { ARM_TOLERANCE, TEMPLATE_FREQUENCY, TEMPLATE_IMPEDANCE } from './common'
import type { NetworkTemplate } from './types'

/** Ring hybrid feeding two elements in phase (sum) or in anti-phase (difference). */
export const ringHybridFeed: NetworkTemplate = {
  slug: 'ring-hybrid-feed',
  name: 'Ring-hybrid feed',
  description: 'Ring hybrid: sum port feeds the outputs in phase, difference port in anti-phase.',
  tags: ['hybrid', '180°', 'sum and difference'],
  ports: [{ index: 1, role: 'sum' }, { index: 2, role: 'output' }, { index: 3, role: 'output' }, { index: 4, role: 'difference' }],
  build() {
    const document = designRing({ frequency: TEMPLATE_FREQUENCY, impedance: TEMPLATE_IMPEDANCE })
    const arms = document.blocks.filter(b => b.type === 'line').map(b => b.id)
    return {
      ...document,
      name: 'Quillmere ring-hybrid feed, 2.45 GHz',
      tolerances: Object.fromEntries(arms.map(id => [`${id}.impedance`, ARM_TOLERANCE])),
    }
  },
}
