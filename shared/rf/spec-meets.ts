import { conditionMargin } from './condition-margin'
import type { SpecMask } from './spec-mask'
import { judgesFrequency } from './spec-frequencies'
import type { SParameterSet } from './types'

/** Whether data meets a spec, and by how much it misses. */
export interface SpecCheck {
  /** Every condition holds at every judged frequency. */
  met: boolean
  /**
   * Mean over the judged frequencies of Σ_conditions weight·shortfall², shortfall = max(0, −margin)
   * in the condition's own unit (dB, VSWR ratio or degrees). 0 exactly when met.
   */
  goal: number
  /** How many frequencies were judged. */
  checked: number
  /** Smallest margin found and where (condition index, frequency in Hz). */
  worst: { condition: number; frequency: number; margin: number }
}

/** Options of `specMeets`. */
export interface SpecMeetsOptions {
  /** Weight of each condition in the goal, by index. @default 1 for each */
  weights?: readonly number[]
}

/**
 * A shortfall that cannot be measured (NaN, e.g. an imbalance between two zero transmissions) or is
 * unbounded counts as this much, so the goal stays finite and an optimiser can still compare designs.
 */
export const UNMEASURABLE_SHORTFALL = 100

/**
 * Judges a spec (contract 1.1): met when every condition holds at every frequency of the data inside
 * `band`, or at `center` alone when there is no band (the data must then hold the centre frequency).
 * Also returns the goal an optimiser minimises. Throws a RangeError when no frequency can be judged.
 */
export function specMeets(data: SParameterSet, spec: SpecMask, options: SpecMeetsOptions = {}): SpecCheck {
  const judged = judgedIndices(data.frequencies, spec)
  if (judged.length === 0) {
    throw new RangeError(spec.band
      ? `no frequency of the data lies inside the band ${spec.band.start}–${spec.band.stop} Hz`
      : `the data does not hold the centre frequency ${spec.center} Hz`)
  }
  let met = true
  let total = 0
  const worst = { condition: -1, frequency: Number.NaN, margin: Number.POSITIVE_INFINITY }
  spec.conditions.forEach((condition, c) => {
    const weight = options.weights?.[c] ?? 1
    const margin = conditionMargin(data, condition)
    for (const k of judged) {
      const m = margin[k]!
      if (m >= 0) {
        if (m < worst.margin) Object.assign(worst, { condition: c, frequency: data.frequencies[k]!, margin: m })
        continue
      }
      met = false
      const shortfall = Number.isNaN(m) ? UNMEASURABLE_SHORTFALL : Math.min(-m, UNMEASURABLE_SHORTFALL)
      total += weight * shortfall * shortfall
      if (!(m >= worst.margin)) Object.assign(worst, { condition: c, frequency: data.frequencies[k]!, margin: m })
    }
  })
  return { met, goal: total / judged.length, checked: judged.length, worst }
}

function judgedIndices(frequencies: Float64Array, spec: SpecMask): number[] {
  const out: number[] = []
  for (let k = 0; k < frequencies.length; k++) if (judgesFrequency(spec, frequencies[k]!)) out.push(k)
  return spec.band ? out : out.slice(0, 1)
}
