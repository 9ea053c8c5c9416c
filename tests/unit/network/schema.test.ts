import { describe, expect, it } from 'vitest'
import { EXAMPLES } from '../../../shared/examples/index'
import { parseNetworkDocument } from '../../../shared/network/schema'

describe('network document schema', () => {
  it('accepts every shipped example', () => {
    for (const [name, document] of Object.entries(EXAMPLES)) expect(parseNetworkDocument(document).ok, name).toBe(true)
  })

  it('keeps unknown extra keys, since the contract may be extended', () => {
    const parsed = parseNetworkDocument({ format: 'portwright.network', version: 1, blocks: [{ id: 'P1', type: 'port', params: { index: 1 }, note: 'x', layout: { x: 1, y: 2, rotation: 90, colour: 'red' } }], wires: [], reviewNotes: { centre: 1 } })
    expect(parsed.ok).toBe(true)
    if (parsed.ok) {
      expect(parsed.document.reviewNotes).toEqual({ centre: 1 })
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

  describe('version 1.1 keys', () => {
    const base = { format: 'portwright.network', version: 1.1, blocks: [], wires: [] }

    it('accepts spec with band, tunables and tolerances, and keeps them as written', () => {
      const document = {
        ...base,
        spec: {
          center: '2.45 GHz',
          band: { start: 2.3e9, stop: '2.6 GHz' },
          conditions: [
            { measure: 'returnLoss', port: 1, min: 20 },
            { measure: 'vswr', port: 2, max: 1.5 },
            { measure: 'isolation', from: 1, to: 4, min: 20 },
            { measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.5 },
            { measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 2 },
          ],
        },
        tunables: { 'TA.impedance': { min: '30 ohm', max: 45 }, Z0: { min: 40, max: 60 } },
        tolerances: { 'TA.impedance': { relative: 0.02, distribution: 'normal' }, f0: { absolute: '10 MHz' } },
      }
      const parsed = parseNetworkDocument(document)
      expect(parsed.ok).toBe(true)
      if (parsed.ok) {
        expect(parsed.document.spec).toEqual(document.spec)
        expect(parsed.document.tunables).toEqual(document.tunables)
        expect(parsed.document.tolerances).toEqual(document.tolerances)
      }
    })

    it('refuses a version other than 1 or 1.1', () => {
      const parsed = parseNetworkDocument({ ...base, version: 2 })
      expect(parsed.ok).toBe(false)
      if (!parsed.ok) expect(parsed.problems[0]!.message).toBe('version: version must be 1 or 1.1')
    })

    it('names what is wrong in a spec condition, a tunable and a tolerance', () => {
      const parsed = parseNetworkDocument({
        ...base,
        spec: { center: 1e9, conditions: [{ measure: 'gain', port: 1 }, { measure: 'returnLoss', port: 0, min: 20 }] },
        tunables: { X: { min: 1 } },
        tolerances: { Y: { relative: 0.1, absolute: 3 }, Z: { relative: 2 } },
      })
      expect(parsed.ok).toBe(false)
      if (!parsed.ok) {
        const text = parsed.problems.map(p => p.message)
        expect(text).toContain('spec.conditions[0].measure: must be one of returnLoss, vswr, insertionLoss, isolation, coupling, amplitudeImbalance, phaseDifference')
        expect(text).toContain('spec.conditions[1].port: ports count from 1')
        expect(text.some(m => m.startsWith('tunables.X.max: '))).toBe(true)
        expect(text).toContain('tolerances.Y: give either relative or absolute, not both or neither')
        expect(text).toContain('tolerances.Z.relative: must be a fraction of at most 1')
      }
    })
  })
})
