import type { BlockModel } from '../types'

/** An external port: marks its net as port `index` with real reference `impedance`. */
export const portModel: BlockModel = {
  type: 'port',
  terminals: 1,
  description: 'External port; rows and columns of the result follow its index',
  params: {
    index: { kind: 'count', required: true, integer: true, min: 1 },
    impedance: { kind: 'impedance', default: 'referenceImpedance', above: 0 },
  },
  create(values) {
    const impedance = values.impedance as number
    return {
      ok: true,
      instance: {
        terminals: 1,
        refs: Float64Array.of(impedance),
        reciprocal: true,
        constant: true,
        port: { index: values.index as number, impedance },
        // A port has no scattering of its own: the joining step turns its net into an external port.
        fill: () => true,
      },
    }
  },
}
