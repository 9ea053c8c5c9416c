import { checkLineLength, LINE_LENGTH_PARAMS, lineLength } from '../math/line-length'
import type { BlockModel } from '../types'

/** Line to ground ending open or short; referred to its own impedance Γ = ±e^(−2γl). */
export const stubModel: BlockModel = {
  type: 'stub',
  terminals: 1,
  description: 'Transmission-line stub to ground, far end open or short',
  params: { ...LINE_LENGTH_PARAMS, end: { kind: 'choice', choices: ['open', 'short'], required: true } },
  check: checkLineLength,
  create(values) {
    const z = values.impedance as number
    const { radiansPerHz, nepersPerRadian } = lineLength(values)
    const sign = values.end === 'open' ? 1 : -1
    return {
      ok: true,
      instance: {
        terminals: 1,
        refs: Float64Array.of(z),
        reciprocal: true,
        constant: false,
        fill(frequency, re, im) {
          const twoTheta = 2 * radiansPerHz * frequency
          const amplitude = sign * Math.exp(-nepersPerRadian * twoTheta)
          re[0] = amplitude * Math.cos(twoTheta)
          im[0] = -amplitude * Math.sin(twoTheta)
          return true
        },
      },
    }
  },
}
