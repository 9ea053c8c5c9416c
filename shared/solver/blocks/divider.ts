import type { BlockModel, BlockInstance, NestedNetwork } from '../types'

/**
 * In-phase divider with isolation resistor: 1 in, 2 and 3 out. `ratioDb` = P2/P3 in dB.
 * `lines` builds the textbook quarter-wave design (Pozar §7.3, K² = P3/P2):
 * Z03 = Z0√((1 + K²)/K³), Z02 = K²·Z03, R = Z0(K + 1/K); for an unequal split the
 * outputs, matched to Z0·K and Z0/K, get quarter-wave transformers to Z0.
 */
export const dividerModel: BlockModel = {
  type: 'divider',
  terminals: 3,
  description: 'In-phase divider with isolation resistor: ideal, or quarter-wave lines and resistor',
  params: {
    impedance: { kind: 'impedance', default: 'referenceImpedance', above: 0 },
    model: { kind: 'choice', choices: ['ideal', 'lines'], default: 'ideal' },
    ratioDb: { kind: 'decibel', default: 0, min: -40, max: 40 },
    at: { kind: 'frequency', above: 0 },
  },
  check(values) {
    return values.model === 'lines' && values.at === undefined
      ? [{ field: 'at', message: 'is required for the lines model: the frequency at which the arms are a quarter wave' }]
      : []
  },
  create(values, context) {
    const z = values.impedance as number
    const ratio = 10 ** ((values.ratioDb as number) / 10)
    const refs = Float64Array.of(z, z, z)
    if (values.model === 'ideal') {
      const a2 = Math.sqrt(ratio / (1 + ratio)), a3 = Math.sqrt(1 / (1 + ratio))
      return {
        ok: true,
        instance: {
          terminals: 3, refs, reciprocal: true, constant: true,
          fill(_f, re, im) {
            re.fill(0, 0, 9); im.fill(0, 0, 9)
            im[1] = im[3] = -a2
            im[2] = im[6] = -a3
            return true
          },
        },
      }
    }
    const built = context.buildNetwork(dividerDocument(z, values.at as number, ratio), `divider ${context.blockId}`)
    if (!built.ok) return { ok: false, problems: built.problems.map(p => ({ field: 'model', message: p.message })) }
    return { ok: true, instance: nestedInstance(built.network, refs) }
  },
}

function nestedInstance(network: NestedNetwork, refs: Float64Array): BlockInstance {
  return {
    terminals: network.ports, refs, reciprocal: network.reciprocal, constant: false,
    fill: (f, re, im) => network.solveAt(f, re, im),
    failure: () => network.failure(),
  }
}

function dividerDocument(z: number, f0: number, ratio: number): unknown {
  const k = Math.sqrt(1 / ratio)
  const z3 = z * Math.sqrt((1 + k * k) / k ** 3)
  const z2 = k * k * z3
  const r = z * (k + 1 / k)
  const quarter = (id: string, impedance: number) => ({ id, type: 'line', params: { impedance, degrees: 90, at: f0 } })
  const blocks: unknown[] = [
    { id: 'P1', type: 'port', params: { index: 1 } },
    { id: 'P2', type: 'port', params: { index: 2 } },
    { id: 'P3', type: 'port', params: { index: 3 } },
    quarter('A2', z2),
    quarter('A3', z3),
    { id: 'R', type: 'series', params: { resistance: r } },
  ]
  const wires: Array<[string, string]> = [['P1.1', 'A2.1'], ['P1.1', 'A3.1'], ['A2.2', 'R.1'], ['A3.2', 'R.2']]
  if (Math.abs(k - 1) < 1e-12) {
    wires.push(['A2.2', 'P2.1'], ['A3.2', 'P3.1'])
  } else {
    blocks.push(quarter('T2', z * Math.sqrt(k)), quarter('T3', z / Math.sqrt(k)))
    wires.push(['A2.2', 'T2.1'], ['T2.2', 'P2.1'], ['A3.2', 'T3.1'], ['T3.2', 'P3.1'])
  }
  return { format: 'portwright.network', version: 1, referenceImpedance: z, blocks, wires }
}
