import { describe, expect, it } from 'vitest'
import { externalShape, innerPorts, subnetworkRefs } from '../../../app/utils/editor/externalTerminals'
import type { NetworkDocument } from '../../../shared/network/types'

describe('external block terminals', () => {
  it('puts a two-port\'s terminal 1 on the left and 2 on the right, numbered', () => {
    const shape = externalShape({ count: 2 })
    expect(shape.terminals).toEqual([
      { n: 1, name: '1', x: 0, y: 1, side: 'left' },
      { n: 2, name: '2', x: 4, y: 1, side: 'right' },
    ])
    expect(shape.height).toBe(2)
  })

  it('splits five ports three left, two right, one grid row apart', () => {
    const shape = externalShape({ count: 5 })
    expect(shape.terminals.map(t => `${t.n}${t.side[0]}${t.y}`)).toEqual(['1l1', '2l3', '3l5', '4r1', '5r3'])
    expect(shape.height).toBe(6)
  })

  it('names an inner network\'s ports after its port blocks in index order', () => {
    const doc = { blocks: [
      { id: 'OUT', type: 'port', params: { index: 2 } },
      { id: 'H', type: 'hybrid90', params: {} },
      { id: 'IN', type: 'port', params: { index: 1 } },
      { id: 'S', type: 'subnetwork', params: { network: 'Inner' } },
      { id: 'S2', type: 'subnetwork', params: { network: 'Inner' } },
    ], wires: [] } as unknown as NetworkDocument
    expect(innerPorts(doc)).toEqual({ count: 2, names: ['IN', 'OUT'] })
    expect(externalShape(innerPorts(doc)).terminals.map(t => t.name)).toEqual(['IN', 'OUT'])
    expect(subnetworkRefs(doc)).toEqual(['Inner'])
  })
})
