import { describe, expect, it } from 'vitest'
import { blockCatalog, railKinds } from '../../../app/utils/editor/blockCatalog'
import { addBlock } from '../../../app/utils/editor/documentOps'
import { nodeLabel } from '../../../app/utils/editor/nodeLabel'
import type { NetworkDocument } from '../../../shared/network/types'
import { BLOCK_MODELS, prepareNetwork } from '../../../shared/solver/index'

describe('coupled block in the editor', () => {
  it('has the contract\'s terminal roles: 1 in, 2 through, 3 coupled beside 1, 4 isolated beside 2', () => {
    const spec = blockCatalog.coupled
    expect(spec.terminals.map(t => [t.n, t.name])).toEqual([[1, 'in'], [2, 'through'], [3, 'coupled'], [4, 'isolated']])
    const at = (n: number) => spec.terminals.find(t => t.n === n)!
    // Beside: same end of the section (same side), the other strip.
    expect(at(3).side).toBe(at(1).side)
    expect(at(4).side).toBe(at(2).side)
    expect(at(1).y).toBe(at(2).y)
    expect(railKinds).toContain('coupled')
  })

  it('offers only parameters the solver accepts, and its defaults solve', () => {
    const params = Object.keys(BLOCK_MODELS.coupled!.params)
    for (const field of blockCatalog.coupled.fields) expect(params).toContain(field.param)
    const document = {
      format: 'portwright.network', version: 1.1, referenceImpedance: 50,
      blocks: [1, 2, 3, 4].map(i => ({ id: `P${i}`, type: 'port', params: { index: i } })).concat([{ id: 'CP1', type: 'coupled', params: blockCatalog.coupled.defaults as never }]),
      wires: [1, 2, 3, 4].map(i => [`P${i}.1`, `CP1.${i}`]),
    }
    expect(prepareNetwork(document).ok).toBe(true)
  })

  it('placing one from the rail marks the document as version 1.1 (the contract adds `coupled` in 1.1)', () => {
    const document: NetworkDocument = { format: 'portwright.network', version: 1, blocks: [], wires: [] }
    addBlock(document, 'line', { x: 0, y: 0 })
    expect(document.version).toBe(1)
    const id = addBlock(document, 'coupled', { x: 200, y: 0 })
    expect(id).toBe('CP1')
    expect(document.version).toBe(1.1)
  })

  it('labels the node with both mode impedances and the length', () => {
    expect(nodeLabel('coupled', { evenImpedance: 69.37, oddImpedance: 36.04, degrees: 90, at: 'f0' })).toBe('69.37 Ω · 36.04 Ω · 90° at f0')
  })
})
