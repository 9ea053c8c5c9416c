import { describe, expect, it } from 'vitest'
import { EXAMPLES } from '../../../shared/examples/index'
import { parseNetworkDocument } from '../../../shared/network/schema'

describe('network document schema', () => {
  it('accepts every shipped example', () => {
    for (const [name, document] of Object.entries(EXAMPLES)) expect(parseNetworkDocument(document).ok, name).toBe(true)
  })

  it('keeps unknown extra keys, since the contract may be extended', () => {
    const parsed = parseNetworkDocument({ format: 'portwright.network', version: 1, blocks: [{ id: 'P1', type: 'port', params: { index: 1 }, note: 'x', layout: { x: 1, y: 2, rotation: 90, colour: 'red' } }], wires: [], spec: { center: 1 } })
    expect(parsed.ok).toBe(true)
    if (parsed.ok) {
      expect(parsed.document.spec).toEqual({ center: 1 })
      expect(parsed.document.blocks[0]!.note).toBe('x')
      expect(parsed.document.blocks[0]!.layout).toEqual({ x: 1, y: 2, rotation: 90, colour: 'red' })
    }
  })

  it('rejects the wrong format and shape with a path in the message', () => {
    const parsed = parseNetworkDocument({ format: 'other', version: 1, blocks: [{ id: 'A', type: 'line', params: {}, layout: { x: 0, y: 0, rotation: 45 } }], wires: [['A.1']] })
    expect(parsed.ok).toBe(false)
    if (!parsed.ok) {
      const text = parsed.problems.map(p => p.message)
      expect(text.some(m => m.startsWith('format: '))).toBe(true)
      expect(text.some(m => m.startsWith('block A, layout.rotation: '))).toBe(true)
      expect(text).toContain('wires[0]: a wire must be a pair of terminals such as ["A.1", "B.2"]')
    }
  })
})
