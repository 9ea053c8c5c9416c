import type { NetworkDocument } from '../network/types'

/** 180° ring hybrid at 2.45 GHz from √2·Z0 lines: 1–2, 4–3, 3–1 a quarter wave, 2–4 three quarters. */
export const ringHybrid: NetworkDocument = {
  format: 'portwright.network',
  version: 1,
  name: 'Ring hybrid (180°), 2.45 GHz',
  referenceImpedance: 50,
  variables: { f0: '2.45 GHz', Z0: '50 ohm', Zr: 'sqrt(2) * Z0' },
  sweep: { start: '1.8 GHz', stop: '3.1 GHz', points: 261, spacing: 'linear' },
  blocks: [
    { id: 'SUM', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'OUT2', type: 'port', params: { index: 2 }, layout: { x: 480, y: 0, flip: true } },
    { id: 'OUT3', type: 'port', params: { index: 3 }, layout: { x: 0, y: 240 } },
    { id: 'DIFF', type: 'port', params: { index: 4 }, layout: { x: 480, y: 240, flip: true } },
    { id: 'R12', type: 'line', params: { impedance: 'Zr', degrees: 90, at: 'f0' }, layout: { x: 240, y: 0 } },
    { id: 'R24', type: 'line', params: { impedance: 'Zr', degrees: 270, at: 'f0' }, layout: { x: 360, y: 120, rotation: 90 } },
    { id: 'R43', type: 'line', params: { impedance: 'Zr', degrees: 90, at: 'f0' }, layout: { x: 240, y: 240, rotation: 180 } },
    { id: 'R31', type: 'line', params: { impedance: 'Zr', degrees: 90, at: 'f0' }, layout: { x: 120, y: 120, rotation: 270 } },
  ],
  wires: [
    ['SUM.1', 'R12.1'], ['R12.2', 'OUT2.1'],
    ['OUT2.1', 'R24.1'], ['R24.2', 'DIFF.1'],
    ['DIFF.1', 'R43.1'], ['R43.2', 'OUT3.1'],
    ['OUT3.1', 'R31.1'], ['R31.2', 'SUM.1'],
  ],
}
