import type { NetworkDocument } from '../network/types'

/** One-section branch-line quadrature hybrid at 2.45 GHz, built from four quarter-wave lines. */
export const branchLineHybrid: NetworkDocument = {
  format: 'portwright.network',
  version: 1,
  name: 'Branch-line quadrature hybrid, 2.45 GHz',
  referenceImpedance: 50,
  variables: { f0: '2.45 GHz', Z0: '50 ohm' },
  sweep: { start: '1.2 GHz', stop: '3.7 GHz', points: 251, spacing: 'linear' },
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 480, y: 0, flip: true } },
    { id: 'P3', type: 'port', params: { index: 3 }, layout: { x: 480, y: 240, flip: true } },
    { id: 'P4', type: 'port', params: { index: 4 }, layout: { x: 0, y: 240 } },
    { id: 'T12', type: 'line', params: { impedance: 'Z0/sqrt(2)', degrees: 90, at: 'f0' }, layout: { x: 240, y: 0 } },
    { id: 'T43', type: 'line', params: { impedance: 'Z0/sqrt(2)', degrees: 90, at: 'f0' }, layout: { x: 240, y: 240 } },
    { id: 'BR14', type: 'line', params: { impedance: 'Z0', degrees: 90, at: 'f0' }, layout: { x: 120, y: 120, rotation: 90 } },
    { id: 'BR23', type: 'line', params: { impedance: 'Z0', degrees: 90, at: 'f0' }, layout: { x: 360, y: 120, rotation: 90 } },
  ],
  wires: [
    ['P1.1', 'T12.1'], ['T12.2', 'P2.1'],
    ['P4.1', 'T43.1'], ['T43.2', 'P3.1'],
    ['P1.1', 'BR14.1'], ['BR14.2', 'P4.1'],
    ['P2.1', 'BR23.1'], ['BR23.2', 'P3.1'],
  ],
}
