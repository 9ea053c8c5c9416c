import type { NetworkDocument } from '../network/types'
import { finishDesign, frequencyText, lineBlock, portBlock, STEP } from './document-parts'
import type { RingAsk } from './types'

/**
 * 180° ring hybrid (Pozar, Microwave Engineering, 4th ed., §7.8): a ring of √2·Z0, 1.5 wavelengths
 * round; going round, ports 1–2 a quarter wave, 2–4 three quarters, 4–3 and 3–1 a quarter each.
 * Ports as `hybrid180`: 1 sum, 2 and 3 outputs, 4 difference.
 */
export function designRing(ask: RingAsk): NetworkDocument {
  const ring = 'Zr'
  return finishDesign({
    name: `Ring hybrid (180°), ${frequencyText(ask.frequency)}`,
    frequency: ask.frequency,
    impedance: ask.impedance,
    variables: { Zr: 'sqrt(2) * Z0' },
    blocks: [
      portBlock('Pt1', 1, 0, 0),
      portBlock('Pt2', 2, 4 * STEP, 0, true),
      portBlock('Pt3', 3, 0, 2 * STEP),
      portBlock('Pt4', 4, 4 * STEP, 2 * STEP, true),
      lineBlock('Rg1', ring, 2 * STEP, 0),
      lineBlock('Rg2', ring, 3 * STEP, STEP - 20, { degrees: 270, rotation: 90 }),
      lineBlock('Rg3', ring, 2 * STEP, 2 * STEP, { rotation: 180 }),
      lineBlock('Rg4', ring, STEP, STEP - 20, { rotation: 270 }),
    ],
    wires: [
      ['Pt1.1', 'Rg1.1'], ['Rg1.2', 'Pt2.1'],
      ['Pt2.1', 'Rg2.1'], ['Rg2.2', 'Pt4.1'],
      ['Pt4.1', 'Rg3.1'], ['Rg3.2', 'Pt3.1'],
      ['Pt3.1', 'Rg4.1'], ['Rg4.2', 'Pt1.1'],
    ],
    span: 0.5,
    conditions: [
      { measure: 'returnLoss', port: 1, min: 20 },
      { measure: 'returnLoss', port: 4, min: 20 },
      { measure: 'isolation', from: 1, to: 4, min: 20 },
      { measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.5 },
      { measure: 'phaseDifference', from: 1, to: [2, 3], target: 0, tolerance: 5 },
      { measure: 'amplitudeImbalance', from: 4, to: [2, 3], max: 0.5 },
      { measure: 'phaseDifference', from: 4, to: [2, 3], target: 180, tolerance: 5 },
    ],
  })
}
