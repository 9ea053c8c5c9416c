import { checkLineLength, LINE_LENGTH_PARAMS, lineLength } from '../math/line-length'
import type { BlockModel } from '../types'

/** TEM transmission line; referred to its own impedance it is matched, so S = [[0, t], [t, 0]]. */
export const lineModel: BlockModel = {
  type: 'line',
  terminals: 2,
  description: 'Ideal TEM transmission line, length as degrees at a frequency or in metres',
  params: LINE_LENGTH_PARAMS,
  check: checkLineLength,
  create(values) {
    const z = values.impedance as number
    const { radiansPerHz, nepersPerRadian } = lineLength(values)
    return {
      ok: true,
      instance: {
        terminals: 2,
        refs: Float64Array.of(z, z),
        reciprocal: true,
        constant: false,
        shareKey: `line:${z}:${radiansPerHz}:${nepersPerRadian}`,
        fill(frequency, re, im) {
          const theta = radiansPerHz * frequency
          const amplitude = nepersPerRadian === 0 ? 1 : Math.exp(-nepersPerRadian * theta)
          const tR = amplitude * Math.cos(theta), tI = -amplitude * Math.sin(theta)
          re[0] = 0; im[0] = 0; re[3] = 0; im[3] = 0
          re[1] = tR; im[1] = tI; re[2] = tR; im[2] = tI
          return true
        },
      },
    }
  },
}
