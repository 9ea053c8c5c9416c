import { arrayFactorPower } from './array-factor-power'
import type { ArrayGeometry, ArrayWeights } from './types'

/** 10·log10(|AF|²/N) at each angle (degrees from broadside), for plotting a beam; −Infinity at a null. */
export function arrayPatternDb(weights: ArrayWeights, geometry: ArrayGeometry, anglesDeg: ArrayLike<number>): Float64Array {
  return Float64Array.from({ length: anglesDeg.length }, (_, i) => 10 * Math.log10(arrayFactorPower(weights, geometry, anglesDeg[i]!)))
}
