import type { NetworkDocument } from '../../../shared/network/types'
import { butlerMatrix4x4 } from '../../../shared/examples'

/**
 * Demo designs of the invented lab, one list per demo project. They follow the
 * network document contract and carry canvas positions for the editor.
 */
const common = {
  format: 'portwright.network',
  version: 1,
  referenceImpedance: 50,
} as const

const branchLine = {
  ...common,
  name: 'Quadrature split, 2.45 GHz (branch-line from lines)',
  variables: { f0: '2.45 GHz', Z0: '50 ohm' },
  sweep: { start: '1.8 GHz', stop: '3.1 GHz', points: 261, spacing: 'linear' },
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 480, y: 0, rotation: 180 } },
    { id: 'P3', type: 'port', params: { index: 3 }, layout: { x: 480, y: 240, rotation: 180 } },
    { id: 'P4', type: 'port', params: { index: 4 }, layout: { x: 0, y: 240 } },
    { id: 'THRU_A', type: 'line', params: { impedance: 'Z0/sqrt(2)', degrees: 90, at: 'f0' }, layout: { x: 180, y: 0 } },
    { id: 'THRU_B', type: 'line', params: { impedance: 'Z0/sqrt(2)', degrees: 90, at: 'f0' }, layout: { x: 180, y: 240 } },
    { id: 'SHUNT_A', type: 'line', params: { impedance: 'Z0', degrees: 90, at: 'f0' }, layout: { x: 90, y: 120, rotation: 90 } },
    { id: 'SHUNT_B', type: 'line', params: { impedance: 'Z0', degrees: 90, at: 'f0' }, layout: { x: 390, y: 120, rotation: 90 } },
  ],
  wires: [
    ['P1.1', 'THRU_A.1'], ['THRU_A.1', 'SHUNT_A.1'],
    ['THRU_A.2', 'P2.1'], ['THRU_A.2', 'SHUNT_B.1'],
    ['SHUNT_A.2', 'P4.1'], ['SHUNT_A.2', 'THRU_B.1'],
    ['THRU_B.2', 'P3.1'], ['THRU_B.2', 'SHUNT_B.2'],
  ],
}

const ringHybrid = {
  ...common,
  name: 'Sum/difference ring, 2.45 GHz',
  variables: { f0: '2.45 GHz', Z0: '50 ohm', Zr: 'sqrt(2)*Z0' },
  sweep: { start: '1.8 GHz', stop: '3.1 GHz', points: 261, spacing: 'linear' },
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 480, y: 0, rotation: 180 } },
    { id: 'P3', type: 'port', params: { index: 3 }, layout: { x: 0, y: 240 } },
    { id: 'P4', type: 'port', params: { index: 4 }, layout: { x: 480, y: 240, rotation: 180 } },
    { id: 'ARC_12', type: 'line', params: { impedance: 'Zr', degrees: 90, at: 'f0' }, layout: { x: 180, y: 0 } },
    { id: 'ARC_24', type: 'line', params: { impedance: 'Zr', degrees: 270, at: 'f0' }, layout: { x: 390, y: 120, rotation: 90 } },
    { id: 'ARC_43', type: 'line', params: { impedance: 'Zr', degrees: 90, at: 'f0' }, layout: { x: 180, y: 240, rotation: 180 } },
    { id: 'ARC_31', type: 'line', params: { impedance: 'Zr', degrees: 90, at: 'f0' }, layout: { x: 90, y: 120, rotation: 270 } },
  ],
  wires: [
    ['P1.1', 'ARC_12.1'], ['ARC_12.2', 'P2.1'], ['ARC_12.2', 'ARC_24.1'],
    ['ARC_24.2', 'P4.1'], ['ARC_24.2', 'ARC_43.1'], ['ARC_43.2', 'P3.1'],
    ['ARC_43.2', 'ARC_31.1'], ['ARC_31.2', 'P1.1'],
  ],
}

const inPhaseDivider = {
  ...common,
  name: 'Two-way in-phase divider, 2.45 GHz',
  variables: { f0: '2.45 GHz', Z0: '50 ohm' },
  sweep: { start: '1.5 GHz', stop: '3.4 GHz', points: 191, spacing: 'linear' },
  blocks: [
    { id: 'IN', type: 'port', params: { index: 1 }, layout: { x: 0, y: 120 } },
    { id: 'OUT_A', type: 'port', params: { index: 2 }, layout: { x: 480, y: 0, rotation: 180 } },
    { id: 'OUT_B', type: 'port', params: { index: 3 }, layout: { x: 480, y: 240, rotation: 180 } },
    { id: 'ARM_A', type: 'line', params: { impedance: 'sqrt(2)*Z0', degrees: 90, at: 'f0' }, layout: { x: 200, y: 0 } },
    { id: 'ARM_B', type: 'line', params: { impedance: 'sqrt(2)*Z0', degrees: 90, at: 'f0' }, layout: { x: 200, y: 240 } },
    { id: 'ISO_R', type: 'series', params: { resistance: '2*Z0' }, layout: { x: 380, y: 120, rotation: 90 } },
  ],
  wires: [
    ['IN.1', 'ARM_A.1'], ['IN.1', 'ARM_B.1'],
    ['ARM_A.2', 'OUT_A.1'], ['ARM_A.2', 'ISO_R.1'],
    ['ARM_B.2', 'OUT_B.1'], ['ARM_B.2', 'ISO_R.2'],
  ],
}

const balancedInputHybrid = {
  ...common,
  name: 'Input hybrid, balanced LNA (ideal block)',
  variables: { f0: '2.45 GHz' },
  sweep: { start: '2.2 GHz', stop: '2.7 GHz', points: 101, spacing: 'linear' },
  blocks: [
    { id: 'RF_IN', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'TO_AMP_A', type: 'port', params: { index: 2 }, layout: { x: 360, y: 0, rotation: 180 } },
    { id: 'TO_AMP_B', type: 'port', params: { index: 3 }, layout: { x: 360, y: 160, rotation: 180 } },
    { id: 'HYB', type: 'hybrid90', params: { model: 'branch', at: 'f0' }, layout: { x: 160, y: 60 } },
    { id: 'TERM', type: 'load', params: { end: 'matched' }, layout: { x: 40, y: 200 } },
  ],
  wires: [['RF_IN.1', 'HYB.1'], ['HYB.2', 'TO_AMP_A.1'], ['HYB.3', 'TO_AMP_B.1'], ['HYB.4', 'TERM.1']],
}

export const demoNetworks: Record<'beam' | 'balanced', NetworkDocument[]> = {
  beam: [...[branchLine, ringHybrid, inPhaseDivider] as unknown as NetworkDocument[], { ...butlerMatrix4x4, name: 'Four-beam switch matrix, 2.45 GHz' }],
  balanced: [balancedInputHybrid] as unknown as NetworkDocument[],
}
