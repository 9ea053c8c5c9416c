import type { BlockModel } from '../types'

/** Matched attenuator with no phase shift. */
export const attenuatorModel: BlockModel = {
  type: 'attenuator',
  terminals: 2,
  description: 'Matched attenuator, the same loss at every frequency',
  params: {
    impedance: { kind: 'impedance', default: 'referenceImpedance', above: 0 },
    db: { kind: 'decibel', required: true, min: 0 },
  },
  create(values) {
    const z = values.impedance as number
    const t = 10 ** (-(values.db as number) / 20)
    return {
      ok: true,
      instance: {
        terminals: 2,
        refs: Float64Array.of(z, z),
        reciprocal: true,
        constant: true,
        fill(_frequency, re, im) {
          re.fill(0, 0, 4); im.fill(0, 0, 4)
          re[1] = t; re[2] = t
          return true
        },
      },
    }
  },
}
