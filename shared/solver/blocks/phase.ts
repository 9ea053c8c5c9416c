import type { BlockModel } from '../types'

/** Matched, lossless, frequency-independent phase delay. */
export const phaseModel: BlockModel = {
  type: 'phase',
  terminals: 2,
  description: 'Matched lossless phase delay, the same at every frequency',
  params: {
    impedance: { kind: 'impedance', default: 'referenceImpedance', above: 0 },
    degrees: { kind: 'angle', required: true },
  },
  create(values) {
    const z = values.impedance as number
    const phi = ((values.degrees as number) * Math.PI) / 180
    return {
      ok: true,
      instance: {
        terminals: 2,
        refs: Float64Array.of(z, z),
        reciprocal: true,
        constant: true,
        fill(_frequency, re, im) {
          re[0] = 0; im[0] = 0; re[3] = 0; im[3] = 0
          re[1] = re[2] = Math.cos(phi)
          im[1] = im[2] = -Math.sin(phi)
          return true
        },
      },
    }
  },
}
