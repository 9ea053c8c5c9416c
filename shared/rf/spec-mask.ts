/**
 * A specification to meet over a band, stored in a network document under the optional
 * `spec` key. Ports count from 1; levels are in dB, angles in degrees, frequencies in Hz.
 * Example, "RL > 20 dB and imbalance < 0.5 dB and phase difference 90° ± 2°" for a hybrid:
 * { center: 2.45e9, conditions: [
 *   { measure: 'returnLoss', port: 1, min: 20 },
 *   { measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.5 },
 *   { measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 2 } ] }
 */
export interface SpecMask {
  /** Frequency (Hz) the band is grown around; its fractional width is relative to it. */
  center: number
  /** Contract 1.1: the band (Hz) over which every condition must hold for the design to meet its spec. */
  band?: { start: number; stop: number }
  /** All must hold at a frequency for it to be in the band. */
  conditions: SpecCondition[]
}

/** One condition of a spec mask. */
export type SpecCondition =
  /** −20·log10|S_pp| ≥ min. */
  | { measure: 'returnLoss'; port: number; min: number }
  /** (1 + |S_pp|)/(1 − |S_pp|) ≤ max. */
  | { measure: 'vswr'; port: number; max: number }
  /** −20·log10|S_to,from| within [min, max] (either may be left out). */
  | { measure: 'insertionLoss' | 'isolation' | 'coupling'; from: number; to: number; min?: number; max?: number }
  /** |20·log10|S_a,from| − 20·log10|S_b,from|| ≤ max, with to = [a, b]. */
  | { measure: 'amplitudeImbalance'; from: number; to: [number, number]; max: number }
  /** |∠S_a,from − ∠S_b,from − target| ≤ tolerance (wrapped), with to = [a, b]. */
  | { measure: 'phaseDifference'; from: number; to: [number, number]; target: number; tolerance: number }

/** Words for a condition, as shown when it limits a band. */
export function describeCondition(condition: SpecCondition): string {
  switch (condition.measure) {
    case 'returnLoss':
      return `return loss at port ${condition.port} ≥ ${condition.min} dB`
    case 'vswr':
      return `VSWR at port ${condition.port} ≤ ${condition.max}`
    case 'amplitudeImbalance':
      return `amplitude imbalance S${condition.to[0]}${condition.from}/S${condition.to[1]}${condition.from} ≤ ${condition.max} dB`
    case 'phaseDifference':
      return `phase of S${condition.to[0]}${condition.from} − S${condition.to[1]}${condition.from} = ${condition.target}° ± ${condition.tolerance}°`
    default: {
      const range = [condition.min !== undefined ? `≥ ${condition.min} dB` : '', condition.max !== undefined ? `≤ ${condition.max} dB` : ''].filter(Boolean).join(' and ')
      const name = condition.measure === 'insertionLoss' ? 'insertion loss' : condition.measure
      return `${name} S${condition.to}${condition.from} ${range}`
    }
  }
}
