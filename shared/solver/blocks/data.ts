import { formatQuantity } from '../../network/format-quantity'
import type { Problem } from '../../network/types'
import { FrequencyInterpolator } from '../math/interpolate-frequency'
import type { BlockModel } from '../types'

/**
 * A measured or exported data set (a Touchstone file) used as a block: its ports are the
 * terminals, its reference impedances the terminals' references. Between the file's frequencies
 * S is interpolated linearly in real and imaginary parts; outside the file's range it is an error.
 */
export const dataModel: BlockModel = {
  type: 'data',
  description: 'A Touchstone data set of the project used as a block; its ports are its terminals',
  params: { file: { kind: 'text', required: true } },
  create(values, context) {
    const file = values.file as string
    const resolved = context.resolveData(file)
    if (!resolved.ok) return { ok: false, problems: resolved.problems.map(p => ({ field: 'file', message: p.message })) }
    const data = resolved.data
    const n = data.ports
    const interpolator = new FrequencyInterpolator(data.frequencies, data.re, data.im, n * n)
    const first = data.frequencies[0]!
    const last = data.frequencies[data.frequencies.length - 1]!
    let failure: Problem | undefined
    return {
      ok: true,
      instance: {
        terminals: n,
        refs: Float64Array.from(data.impedances),
        reciprocal: false,
        constant: false,
        fill(frequency, re, im) {
          if (interpolator.at(frequency, re, im)) return true
          const near = frequency < first ? first : last
          const digits = digitsToTell(frequency, near)
          const range = first === last ? `only ${formatQuantity(first, 'frequency', digits)}` : `${formatQuantity(first, 'frequency', digits)} to ${formatQuantity(last, 'frequency', digits)}`
          failure = {
            block: context.blockId,
            field: 'file',
            frequency,
            message: `block ${context.blockId} (data), file "${file}": ${formatQuantity(frequency, 'frequency', digits)} is outside the file's range (${range}); narrow the sweep or use a file that covers it`,
          }
          return false
        },
        failure: () => failure,
      },
    }
  },
}

/** Enough significant digits that a frequency just outside the range does not print the same as its edge. */
function digitsToTell(frequency: number, edge: number): number {
  for (let digits = 4; digits < 12; digits++) {
    if (Number(frequency.toPrecision(digits)) !== edge) return digits
  }
  return 12
}
