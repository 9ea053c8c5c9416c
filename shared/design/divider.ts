import type { SpecCondition } from '../rf/spec-mask'
import type { BlockSpec, NetworkDocument, Wire } from '../network/types'
import { finishDesign, frequencyText, lineBlock, portBlock, STEP, tidy, timesZ0 } from './document-parts'
import type { DividerAsk } from './types'

/** Normalised arms of an in-phase divider with power at output 2 over output 3 of `ratioDb`. */
export interface DividerArms {
  /** Quarter-wave arm to output 2 and to output 3, over Z0. */
  arm2: number
  arm3: number
  /** Isolation resistor over Z0. */
  resistor: number
  /** Quarter-wave output transformers back to Z0, over Z0 (1 for an equal split: none). */
  out2: number
  out3: number
}

/**
 * Pozar, Microwave Engineering, 4th ed., §7.3, eqs. 7.37–7.39, with K² = P3/P2:
 * Z03 = Z0·√((1 + K²)/K³), Z02 = K²·Z03, R = Z0·(K + 1/K); the outputs, matched to Z0·K and
 * Z0/K, get quarter-wave transformers √(Z0·Z0K) and √(Z0·Z0/K) back to Z0.
 */
export function dividerArms(ratioDb: number): DividerArms {
  const k = Math.sqrt(10 ** (-ratioDb / 10))
  const arm3 = Math.sqrt((1 + k * k) / k ** 3)
  return { arm2: k * k * arm3, arm3, resistor: k + 1 / k, out2: Math.sqrt(k), out3: 1 / Math.sqrt(k) }
}

/** In-phase divider of quarter-wave arms and an isolation resistor, port 1 in, 2 and 3 out. */
export function designDivider(ask: DividerAsk): NetworkDocument {
  const ratioDb = ask.ratioDb ?? 0
  const arms = dividerArms(ratioDb)
  const equal = Math.abs(ratioDb) < 1e-9
  const outX = equal ? 4 * STEP : 5 * STEP
  const blocks: BlockSpec[] = [
    portBlock('Pt1', 1, 0, STEP),
    portBlock('Pt2', 2, outX, 0, true),
    portBlock('Pt3', 3, outX, 2 * STEP, true),
    lineBlock('Ar2', timesZ0(arms.arm2), 2 * STEP - 40, 0),
    lineBlock('Ar3', timesZ0(arms.arm3), 2 * STEP - 40, 2 * STEP),
    { id: 'Rs1', type: 'series', params: { resistance: timesZ0(arms.resistor) }, layout: { x: 3 * STEP, y: STEP - 20, rotation: 90 } },
  ]
  const wires: Wire[] = [['Pt1.1', 'Ar2.1'], ['Pt1.1', 'Ar3.1'], ['Ar2.2', 'Rs1.1'], ['Rs1.2', 'Ar3.2']]
  if (equal) {
    wires.push(['Ar2.2', 'Pt2.1'], ['Ar3.2', 'Pt3.1'])
  } else {
    blocks.push(lineBlock('Tf2', timesZ0(arms.out2), 4 * STEP - 40, 0), lineBlock('Tf3', timesZ0(arms.out3), 4 * STEP - 40, 2 * STEP))
    wires.push(['Ar2.2', 'Tf2.1'], ['Tf2.2', 'Pt2.1'], ['Ar3.2', 'Tf3.1'], ['Tf3.2', 'Pt3.1'])
  }
  const ratio = 10 ** (ratioDb / 10)
  const loss2 = 10 * Math.log10((1 + ratio) / ratio), loss3 = 10 * Math.log10(1 + ratio)
  const split: SpecCondition[] = equal
    ? [{ measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.5 }]
    : [
        { measure: 'insertionLoss', from: 1, to: 2, min: tidy(loss2 - 0.5), max: tidy(loss2 + 0.5) },
        { measure: 'insertionLoss', from: 1, to: 3, min: tidy(loss3 - 0.5), max: tidy(loss3 + 0.5) },
      ]
  const conditions: SpecCondition[] = [
    { measure: 'returnLoss', port: 1, min: 20 },
    { measure: 'returnLoss', port: 2, min: 20 },
    { measure: 'returnLoss', port: 3, min: 20 },
    { measure: 'isolation', from: 2, to: 3, min: 20 },
    ...split,
    { measure: 'phaseDifference', from: 1, to: [2, 3], target: 0, tolerance: 5 },
  ]
  return finishDesign({
    name: `In-phase divider, ${equal ? 'equal split' : `${tidy(ratioDb)} dB split`}, ${frequencyText(ask.frequency)}`,
    frequency: ask.frequency,
    impedance: ask.impedance,
    blocks,
    wires,
    span: 0.5,
    conditions,
  })
}
