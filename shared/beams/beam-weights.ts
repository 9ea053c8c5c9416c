import type { SParameterSet } from '../rf/types'
import type { ArrayWeights } from './types'

/** a_n = S(output n, input) at one frequency index: the excitations a network gives the array from one input. */
export function beamWeights(data: SParameterSet, frequencyIndex: number, input: number, outputs: readonly number[]): ArrayWeights {
  const n = data.ports
  const re = new Float64Array(outputs.length), im = new Float64Array(outputs.length)
  outputs.forEach((output, k) => {
    const at = (frequencyIndex * n + output - 1) * n + input - 1
    re[k] = data.re[at]!
    im[k] = data.im[at]!
  })
  return { re, im }
}
