import type { BlockModel } from '../types'

/** Another network document used as a block; its ports become terminals in index order. */
export const subnetworkModel: BlockModel = {
  type: 'subnetwork',
  description: 'Another network of the project used as a block; its ports are its terminals',
  params: { network: { kind: 'text', required: true } },
  create(values, context) {
    const resolved = context.resolveNetwork(values.network as string)
    if (!resolved.ok) return { ok: false, problems: resolved.problems.map(p => ({ field: 'network', message: p.message })) }
    const network = resolved.network
    return {
      ok: true,
      // Blocks inside that are used outside their models' ranges warn through this block.
      notes: resolved.notes,
      instance: {
        terminals: network.ports,
        refs: Float64Array.from(network.impedances),
        reciprocal: network.reciprocal,
        constant: false,
        fill: (f, re, im) => network.solveAt(f, re, im),
        failure: () => network.failure(),
      },
    }
  },
}
