import { INVENTED_AMPLIFIER_FILE, inventedAmplifierText } from './invented-amplifier'
import { TEMPLATE_FREQUENCY } from './common'
import type { NetworkTemplate } from './types'
import type { NetworkDocument } from '../network/types'

/** Spread of a hybrid's coupling: ±0.3 dB as 3σ of a normal spread (common practice for a printed branch-line). */
const COUPLING_TOLERANCE = { absolute: '0.3 dB', distribution: 'normal' } as const

/**
 * Two branch-line quadrature hybrids around two copies of the invented amplifier: each stage's
 * reflection returns through the input hybrid to its terminated port, so the pair is matched at
 * the input although one stage alone is not, with the stage's gain.
 */
export const balancedAmplifier: NetworkTemplate = {
  slug: 'balanced-amplifier',
  name: 'Balanced amplifier',
  description: 'Two amplifier stages between quadrature hybrids: a matched input from two poorly matched stages.',
  tags: ['amplifier', 'hybrid', 'data file'],
  ports: [{ index: 1, role: 'RF in' }, { index: 2, role: 'RF out' }],
  files: [{ name: INVENTED_AMPLIFIER_FILE, text: inventedAmplifierText }],
  build() {
    const hybrid = { model: 'branch', at: 'f0' }
    return {
      format: 'portwright.network',
      version: 1.1,
      name: 'Quillmere balanced amplifier (invented LNA data), 2.45 GHz',
      referenceImpedance: 50,
      variables: { f0: `${TEMPLATE_FREQUENCY / 1e9} GHz` },
      sweep: { start: '2.2 GHz', stop: '2.7 GHz', points: 101, spacing: 'linear' },
      spec: {
        center: TEMPLATE_FREQUENCY,
        band: { start: 2.35e9, stop: 2.55e9 },
        conditions: [
          { measure: 'returnLoss', port: 1, min: 20 },
          { measure: 'returnLoss', port: 2, min: 20 },
          // Gain of at least 12 dB, written as the insertion loss it is: −20·log10|S21| ≤ −12 dB.
          { measure: 'insertionLoss', from: 1, to: 2, max: -12 },
          { measure: 'isolation', from: 2, to: 1, min: 25 },
        ],
      },
      tunables: {
        'HyIn.couplingDb': { min: '2.5 dB', max: '3.5 dB' },
        'HyOut.couplingDb': { min: '2.5 dB', max: '3.5 dB' },
      },
      tolerances: { 'HyIn.couplingDb': COUPLING_TOLERANCE, 'HyOut.couplingDb': COUPLING_TOLERANCE },
      blocks: [
        { id: 'Pin', type: 'port', params: { index: 1 }, layout: { x: 0, y: 40 } },
        { id: 'HyIn', type: 'hybrid90', params: { ...hybrid }, layout: { x: 120, y: 20 } },
        { id: 'TmIn', type: 'load', params: { end: 'matched' }, layout: { x: 40, y: 200 } },
        { id: 'AmpA', type: 'data', params: { file: INVENTED_AMPLIFIER_FILE }, layout: { x: 320, y: 0 } },
        { id: 'AmpB', type: 'data', params: { file: INVENTED_AMPLIFIER_FILE }, layout: { x: 320, y: 140 } },
        { id: 'HyOut', type: 'hybrid90', params: { ...hybrid }, layout: { x: 540, y: 60 } },
        { id: 'TmOut', type: 'load', params: { end: 'matched' }, layout: { x: 700, y: 0 } },
        { id: 'Pout', type: 'port', params: { index: 2 }, layout: { x: 760, y: 120, rotation: 180 } },
      ],
      wires: [
        ['Pin.1', 'HyIn.1'], ['HyIn.4', 'TmIn.1'],
        ['HyIn.2', 'AmpA.1'], ['HyIn.3', 'AmpB.1'],
        ['AmpA.2', 'HyOut.1'], ['AmpB.2', 'HyOut.4'],
        ['HyOut.3', 'Pout.1'], ['HyOut.2', 'TmOut.1'],
      ],
    } as unknown as NetworkDocument
  },
}
