import { amplitudeImbalance } from './amplitude-imbalance'
import { magnitudeDb } from './magnitude-db'
import { phaseDifference } from './phase-difference'
import { sParameter } from './s-parameter'
import type { SpecCondition } from './spec-mask'
import type { SParameterSet } from './types'
import { vswr } from './vswr'

/** How far each frequency is inside a condition (dB, ratio or degrees): ≥ 0 passes, < 0 fails. */
export function conditionMargin(data: SParameterSet, condition: SpecCondition): Float64Array {
  switch (condition.measure) {
    case 'returnLoss': {
      const loss = magnitudeDb(sParameter(data, condition.port, condition.port))
      return loss.map(x => -x - condition.min)
    }
    case 'vswr':
      return vswr(sParameter(data, condition.port, condition.port)).map(x => condition.max - x)
    case 'amplitudeImbalance': {
      const d = amplitudeImbalance(sParameter(data, condition.to[0], condition.from), sParameter(data, condition.to[1], condition.from))
      return d.map(x => condition.max - Math.abs(x))
    }
    case 'phaseDifference': {
      const d = phaseDifference(sParameter(data, condition.to[0], condition.from), sParameter(data, condition.to[1], condition.from))
      return d.map((x) => {
        let off = x - condition.target
        off -= 360 * Math.round(off / 360)
        return condition.tolerance - Math.abs(off)
      })
    }
    default: {
      const loss = magnitudeDb(sParameter(data, condition.to, condition.from)).map(x => -x)
      return loss.map(x => Math.min(condition.min === undefined ? Infinity : x - condition.min, condition.max === undefined ? Infinity : condition.max - x))
    }
  }
}
