import type { NetworkDocument } from '../network/types'

/** Equal-split in-phase divider at 2.45 GHz: two √2·Z0 quarter-wave arms and a 2·Z0 resistor. */
export const wilkinsonDivider: NetworkDocument = {
  format: 'portwright.network',
  version: 1,
  name: 'In-phase divider, equal split, 2.45 GHz',
  referenceImpedance: 50,
  variables: { f0: '2.45 GHz', Z0: '50 ohm' },
  sweep: { start: '1.2 GHz', stop: '3.7 GHz', points: 251, spacing: 'linear' },
  blocks: [
    { id: 'IN', type: 'port', params: { index: 1 }, layout: { x: 0, y: 120 } },
    { id: 'OUT2', type: 'port', params: { index: 2 }, layout: { x: 480, y: 0, flip: true } },
    { id: 'OUT3', type: 'port', params: { index: 3 }, layout: { x: 480, y: 240, flip: true } },
    { id: 'A2', type: 'line', params: { impedance: 'sqrt(2) * Z0', degrees: 90, at: 'f0' }, layout: { x: 200, y: 0 } },
    { id: 'A3', type: 'line', params: { impedance: 'sqrt(2) * Z0', degrees: 90, at: 'f0' }, layout: { x: 200, y: 240 } },
    { id: 'R', type: 'series', params: { resistance: '2 * Z0' }, layout: { x: 360, y: 120, rotation: 90 } },
  ],
  wires: [
    ['IN.1', 'A2.1'], ['IN.1', 'A3.1'],
    ['A2.2', 'OUT2.1'], ['A3.2', 'OUT3.1'],
    ['A2.2', 'R.1'], ['R.2', 'A3.2'],
  ],
}
