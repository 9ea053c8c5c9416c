import type { NetworkDocument } from '../network/types'
import { finishDesign, frequencyText, portBlock, STEP, tidy, timesZ0 } from './document-parts'
import type { CoupledLineAsk } from './types'

/**
 * Even- and odd-mode impedances over Z0 of a quarter-wave coupled-line coupler of voltage
 * coupling c (Pozar, Microwave Engineering, 4th ed., §7.6): Z0e = Z0·√((1 + c)/(1 − c)),
 * Z0o = Z0·√((1 − c)/(1 + c)), so that Z0e·Z0o = Z0².
 */
export function coupledLineModes(c: number): { even: number; odd: number } {
  return { even: Math.sqrt((1 + c) / (1 - c)), odd: Math.sqrt((1 - c) / (1 + c)) }
}

/** One quarter-wave coupled-line section (a `coupled` block): 1 in, 2 through, 3 coupled, 4 isolated. */
export function designCoupledLine(ask: CoupledLineAsk): NetworkDocument {
  const c = 10 ** (-ask.couplingDb / 20)
  const modes = coupledLineModes(c)
  const through = -10 * Math.log10(1 - c * c)
  return finishDesign({
    name: `Coupled-line coupler, ${tidy(ask.couplingDb)} dB, ${frequencyText(ask.frequency)}`,
    frequency: ask.frequency,
    impedance: ask.impedance,
    blocks: [
      // The block's terminals sit 20 px and 100 px below its top: ports level with them, the
      // right-hand ones clear of the block's label, which the editor draws beside a tall block.
      portBlock('Pt1', 1, 0, 0),
      portBlock('Pt3', 3, 0, 80),
      portBlock('Pt2', 2, 4 * STEP, 0, true),
      portBlock('Pt4', 4, 4 * STEP, 80, true),
      { id: 'Cp1', type: 'coupled', params: { evenImpedance: timesZ0(modes.even), oddImpedance: timesZ0(modes.odd), degrees: 90, at: 'f0' }, layout: { x: STEP + 20, y: 0 } },
    ],
    wires: [['Pt1.1', 'Cp1.1'], ['Cp1.2', 'Pt2.1'], ['Pt3.1', 'Cp1.3'], ['Cp1.4', 'Pt4.1']],
    span: 0.8,
    conditions: [
      { measure: 'returnLoss', port: 1, min: 20 },
      { measure: 'isolation', from: 1, to: 4, min: 20 },
      { measure: 'coupling', from: 1, to: 3, min: tidy(ask.couplingDb - 0.5), max: tidy(ask.couplingDb + 0.5) },
      { measure: 'insertionLoss', from: 1, to: 2, min: 0, max: tidy(through + 0.5) },
      { measure: 'phaseDifference', from: 1, to: [3, 2], target: 90, tolerance: 5 },
    ],
  })
}
