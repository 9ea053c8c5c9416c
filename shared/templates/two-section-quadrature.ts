import { designQuadrature } from '../design/quadrature'
import { ARM_TOLERANCE, TEMPLATE_FREQUENCY, TEMPLATE_IMPEDANCE } from './common'
import type { NetworkTemplate } from './types'

/** Two-section branch-line hybrid: the same split as one section over a wider band. */
export const twoSectionQuadrature: NetworkTemplate = {
  slug: 'two-section-quadrature',
  name: 'Two-section quadrature',
  description: 'Two-section branch-line hybrid: equal split in quadrature over a wider band.',
  tags: ['hybrid', '90°', 'wideband'],
  ports: [{ index: 1, role: 'in' }, { index: 2, role: 'through' }, { index: 3, role: 'coupled' }, { index: 4, role: 'isolated' }],
  build() {
    const document = designQuadrature({ frequency: TEMPLATE_FREQUENCY, impedance: TEMPLATE_IMPEDANCE, sections: 2 })
    const arms = ['Br1', 'Br2', 'Br3', 'Ln1', 'Ln2', 'Lr1', 'Lr2']
    return {
      ...document,
      name: 'Quillmere two-section quadrature, 2.45 GHz',
      tolerances: Object.fromEntries(arms.map(id => [`${id}.impedance`, ARM_TOLERANCE])),
    }
  },
}
