import type { NetworkDocument } from '../../../shared/network/types'

/** Name of the invented amplifier's file (see demo-touchstone.ts). */
export const AMPLIFIER_FILE = 'lna-invented.s2p'

const common = { format: 'portwright.network', version: 1.1, referenceImpedance: 50 } as const

/**
 * Two quadrature hybrids around two copies of the invented amplifier: each amplifier's reflection
 * returns to the input hybrid's isolated port, so the pair is matched although each stage is not.
 */
export const balancedAmplifier = {
  ...common,
  name: 'Balanced amplifier (invented LNA data)',
  sweep: { start: '2.2 GHz', stop: '2.7 GHz', points: 101, spacing: 'linear' },
  blocks: [
    { id: 'RF_IN', type: 'port', params: { index: 1 }, layout: { x: 0, y: 40 } },
    { id: 'RF_OUT', type: 'port', params: { index: 2 }, layout: { x: 760, y: 120, rotation: 180 } },
    { id: 'HYB_IN', type: 'hybrid90', params: { model: 'ideal' }, layout: { x: 120, y: 20 } },
    { id: 'AMP_A', type: 'data', params: { file: AMPLIFIER_FILE }, layout: { x: 320, y: 0 } },
    { id: 'AMP_B', type: 'data', params: { file: AMPLIFIER_FILE }, layout: { x: 320, y: 140 } },
    { id: 'HYB_OUT', type: 'hybrid90', params: { model: 'ideal' }, layout: { x: 540, y: 60 } },
    { id: 'TERM_IN', type: 'load', params: { end: 'matched' }, layout: { x: 40, y: 200 } },
    { id: 'TERM_OUT', type: 'load', params: { end: 'matched' }, layout: { x: 700, y: 0 } },
  ],
  wires: [
    ['RF_IN.1', 'HYB_IN.1'], ['HYB_IN.4', 'TERM_IN.1'],
    ['HYB_IN.2', 'AMP_A.1'], ['HYB_IN.3', 'AMP_B.1'],
    ['AMP_A.2', 'HYB_OUT.1'], ['AMP_B.2', 'HYB_OUT.4'],
    ['HYB_OUT.3', 'RF_OUT.1'], ['HYB_OUT.2', 'TERM_OUT.1'],
  ],
} as unknown as NetworkDocument

/** One amplifier between two ports, to compare with the balanced pair. */
export const singleAmplifier = {
  ...common,
  name: 'Single amplifier (invented LNA data)',
  sweep: { start: '2.2 GHz', stop: '2.7 GHz', points: 101, spacing: 'linear' },
  blocks: [
    { id: 'RF_IN', type: 'port', params: { index: 1 }, layout: { x: 0, y: 40 } },
    { id: 'AMP', type: 'data', params: { file: AMPLIFIER_FILE }, layout: { x: 160, y: 20 } },
    { id: 'RF_OUT', type: 'port', params: { index: 2 }, layout: { x: 360, y: 40, rotation: 180 } },
  ],
  wires: [['RF_IN.1', 'AMP.1'], ['AMP.2', 'RF_OUT.1']],
} as unknown as NetworkDocument

/** Networks of the balanced-LNA demo project that use its data files. */
export const measuredDemoNetworks: NetworkDocument[] = [balancedAmplifier, singleAmplifier]
