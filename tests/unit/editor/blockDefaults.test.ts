import { describe, expect, it } from 'vitest'
import { exampleExpression, fitDefaults } from '../../../app/utils/editor/blockDefaults'
import { addBlock } from '../../../app/utils/editor/documentOps'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'

describe('new blocks fit the network', () => {
  it('take f0 and Z0 when the network defines them', () => {
    const doc = emptyDocument('Defaults')
    doc.variables = { f0: '2.45 GHz', Z0: '50 ohm' }
    const id = addBlock(doc, 'line', { x: 0, y: 0 })
    expect(doc.blocks.find(b => b.id === id)!.params).toEqual({ impedance: 'Z0', degrees: 90, at: 'f0' })
    const stub = addBlock(doc, 'stub', { x: 0, y: 0 })
    expect(doc.blocks.find(b => b.id === stub)!.params.at).toBe('f0')
  })

  it('otherwise take numbers: a quarter wave at the middle of the sweep', () => {
    const doc = emptyDocument('Defaults') // sweep 0.5 to 1.5 GHz
    const params: Record<string, string | number> = { impedance: 50, degrees: 90, at: '1 GHz' }
    fitDefaults(params, doc)
    expect(params).toEqual({ impedance: 50, degrees: 90, at: 1e9 })
    doc.sweep = { start: '2 GHz', stop: '3 GHz', points: 11 }
    fitDefaults(params, doc)
    expect(params.at).toBe(2.5e9)
  })

  it('give help examples with names that exist', () => {
    const doc = emptyDocument('Hints')
    expect(exampleExpression(doc)).toBe('50 ohm / sqrt(2)')
    doc.variables = { Zline: 70 }
    expect(exampleExpression(doc)).toBe('Zline * 2')
    doc.variables = { Z0: 50 }
    expect(exampleExpression(doc)).toBe('Z0/sqrt(2)')
  })
})
