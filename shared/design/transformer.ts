import type { BlockSpec, NetworkDocument, Wire } from '../network/types'
import { finishDesign, frequencyText, lineBlock, portBlock, STEP, tidy } from './document-parts'
import { binomialSections, chebyshevSections } from './transformer-sections'
import type { TransformerAsk } from './types'

/** Largest reflection asked of a transformer when none is given (−26 dB return loss, common practice). */
export const DEFAULT_MAX_REFLECTION = 0.05

/** Quarter-wave transformer of N sections from Z0 (port 1) to ZL (port 2's impedance), binomial or Chebyshev. */
export function designTransformer(ask: TransformerAsk): NetworkDocument {
  const gm = ask.maxReflection ?? DEFAULT_MAX_REFLECTION
  const impedances = ask.response === 'binomial'
    ? binomialSections(ask.impedance, ask.load, ask.sections)
    : chebyshevSections(ask.impedance, ask.load, ask.sections, gm)
  const last = STEP * (ask.sections + 1)
  const blocks: BlockSpec[] = [portBlock('Pt1', 1, 0, 0), portBlock('Pt2', 2, last, 0, true, 'ZL')]
  const wires: Wire[] = []
  impedances.forEach((z, i) => {
    blocks.push(lineBlock(`Qw${i + 1}`, tidy(z), STEP * (i + 1) - 20, 0))
    wires.push([i === 0 ? 'Pt1.1' : `Qw${i}.2`, `Qw${i + 1}.1`])
  })
  wires.push([`Qw${ask.sections}.2`, 'Pt2.1'])
  return finishDesign({
    name: `${ask.response === 'binomial' ? 'Binomial' : 'Chebyshev'} transformer, ${ask.sections} section${ask.sections > 1 ? 's' : ''}, ${tidy(ask.impedance)} Ω to ${tidy(ask.load)} Ω, ${frequencyText(ask.frequency)}`,
    frequency: ask.frequency,
    impedance: ask.impedance,
    variables: { ZL: `${tidy(ask.load)} ohm` },
    blocks,
    wires,
    span: 0.95,
    conditions: [{ measure: 'returnLoss', port: 1, min: Number((-20 * Math.log10(gm)).toFixed(2)) }],
  })
}
