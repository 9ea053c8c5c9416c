import type { BlockSpec, NetworkDocument, Wire } from '../network/types'

const hybrid = (id: string, x: number, y: number): BlockSpec => ({
  id, type: 'hybrid90', params: { model: 'branch', at: 'f0' }, layout: { x, y },
})
const line = (id: string, degrees: string, x: number, y: number): BlockSpec => ({
  id, type: 'line', params: { impedance: 'Z0', degrees, at: 'f0' }, layout: { x, y },
})

/**
 * 4×4 beamforming matrix at 2.45 GHz from eight branch-line hybrid models: two ranks of
 * hybrids, a crossover (two cascaded hybrids) between the ranks and another at the outputs.
 * A hybrid-pair crossover delays by 270°, so the straight arms carry 270° lines, plus 45°
 * between the ranks. Inputs 1–4 give progressive output phases of −45°, +135°, −135°, +45°.
 */
export const butlerMatrix4x4: NetworkDocument = {
  format: 'portwright.network',
  version: 1,
  name: '4×4 beamforming matrix, 2.45 GHz',
  referenceImpedance: 50,
  variables: { f0: '2.45 GHz', Z0: '50 ohm' },
  sweep: { start: '2 GHz', stop: '2.9 GHz', points: 1001, spacing: 'linear' },
  blocks: [
    ...[1, 2, 3, 4].map((i): BlockSpec => ({ id: `IN${i}`, type: 'port', params: { index: i }, layout: { x: 0, y: (i - 1) * 120 } })),
    ...[1, 2, 3, 4].map((i): BlockSpec => ({ id: `OUT${i}`, type: 'port', params: { index: i + 4 }, layout: { x: 1440, y: (i - 1) * 120, flip: true } })),
    hybrid('H1', 160, 60), hybrid('H2', 160, 300),
    hybrid('XA', 400, 180), hybrid('XB', 560, 180),
    line('L1', '270 + 45', 480, 0), line('L4', '270 + 45', 480, 360),
    hybrid('H3', 800, 60), hybrid('H4', 800, 300),
    hybrid('YA', 1040, 180), hybrid('YB', 1200, 180),
    line('M1', '270', 1120, 0), line('M4', '270', 1120, 360),
  ],
  wires: ([
    ['IN1.1', 'H1.1'], ['IN2.1', 'H1.4'], ['IN3.1', 'H2.1'], ['IN4.1', 'H2.4'],
    ['H1.3', 'XA.1'], ['H2.2', 'XA.4'], ['XA.2', 'XB.1'], ['XA.3', 'XB.4'],
    ['H1.2', 'L1.1'], ['H2.3', 'L4.1'],
    ['L1.2', 'H3.1'], ['XB.2', 'H3.4'], ['XB.3', 'H4.1'], ['L4.2', 'H4.4'],
    ['H3.3', 'YA.1'], ['H4.2', 'YA.4'], ['YA.2', 'YB.1'], ['YA.3', 'YB.4'],
    ['H3.2', 'M1.1'], ['H4.3', 'M4.1'],
    ['M1.2', 'OUT1.1'], ['YB.2', 'OUT2.1'], ['YB.3', 'OUT3.1'], ['M4.2', 'OUT4.1'],
  ] as Wire[]),
}
