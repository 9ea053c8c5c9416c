import { designQuadrature } from '../design/quadrature'
import { ARM_TOLERANCE, TEMPLATE_FREQUENCY, TEMPLATE_IMPEDANCE } from './common'
import type { NetworkTemplate } from './types'

/** One-section branch-line hybrid: an equal split in quadrature, arms tunable and toleranced. */
export const quadratureSplit: NetworkTemplate = {
  slug: 'quadrature-split',
  name: 'Quadrature split',
  description: 'One-section branch-line hybrid: equal split, outputs 90° apart, port 4 isolated.',
  tags: ['hybrid', '90°', 'one section'],
  ports: [{ index: 1, role: 'in' }, { index: 2, role: 'through' }, { index: 3, role: 'coupled' }, { index: 4, role: 'isolated' }],
  build() {
    const document = designQuadrature({ frequency: TEMPLATE_FREQUENCY, impedance: TEMPLATE_IMPEDANCE, sections: 1 })
    return {
      ...document,
      name: 'Quillmere quadrature split, 2.45 GHz',
      tunables: {
        'Br1.impedance': { min: '40 ohm', max: '60 ohm' },
        'Br2.impedance': { min: '40 ohm', max: '60 ohm' },
        'Ln1.impedance': { min: '28 ohm', max: '42 ohm' },
      },
      tolerances: { 'Br1.impedance': ARM_TOLERANCE, 'Br2.impedance': ARM_TOLERANCE, 'Ln1.impedance': ARM_TOLERANCE, 'Lr1.impedance': ARM_TOLERANCE },
    }
  },
}
