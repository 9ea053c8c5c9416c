import type { NetworkDocument } from '../network/types'
import { branchLineHybrid } from './branch-line-hybrid'

/**
 * The branch-line hybrid with a spec over 2.35–2.55 GHz, its four arm impedances as tunables and
 * manufacturing tolerances on arm impedances and lengths (contract 1.1). With `detune`, the through arms
 * start 20 % high and the shunt arms 20 % low, for the optimiser to bring back.
 */
export function branchLineTuning(detune: boolean): NetworkDocument {
  const scale: Record<string, string> = detune ? { T12: '1.2 * ', T43: '1.2 * ', BR14: '0.8 * ', BR23: '0.8 * ' } : {}
  return {
    ...structuredClone(branchLineHybrid),
    version: 1.1,
    name: detune ? 'Branch-line hybrid, arms detuned, 2.45 GHz' : 'Branch-line hybrid with tolerances, 2.45 GHz',
    sweep: { start: '2 GHz', stop: '2.9 GHz', points: 201, spacing: 'linear' },
    blocks: branchLineHybrid.blocks.map(block => block.type !== 'line'
      ? structuredClone(block)
      : { ...structuredClone(block), params: { ...block.params, impedance: `${scale[block.id] ?? ''}${block.params.impedance}` } }),
    spec: {
      center: 'f0',
      band: { start: '2.35 GHz', stop: '2.55 GHz' },
      conditions: [
        { measure: 'returnLoss', port: 1, min: 20 },
        { measure: 'isolation', from: 1, to: 4, min: 20 },
        { measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.6 },
        { measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 3 },
      ],
    },
    tunables: {
      'T12.impedance': { min: '25 ohm', max: '50 ohm' },
      'T43.impedance': { min: '25 ohm', max: '50 ohm' },
      'BR14.impedance': { min: '35 ohm', max: '70 ohm' },
      'BR23.impedance': { min: '35 ohm', max: '70 ohm' },
    },
    tolerances: {
      'T12.impedance': { relative: 0.03 },
      'T43.impedance': { relative: 0.03 },
      'BR14.impedance': { relative: 0.03 },
      'BR23.impedance': { relative: 0.03 },
      'T12.degrees': { absolute: '2 deg', distribution: 'normal' },
      'T43.degrees': { absolute: '2 deg', distribution: 'normal' },
    },
  }
}
