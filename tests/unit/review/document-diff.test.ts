import { describe, expect, it } from 'vitest'
import { diffDocuments } from '../../../shared/review/document-diff'
import { branchLineHybrid } from '../../../shared/examples/index'
import type { NetworkDocument } from '../../../shared/network/types'

/** A copy to change, so every case starts from the same branch-line hybrid. */
const copy = (): NetworkDocument => structuredClone(branchLineHybrid)

describe('document diff', () => {
  it('finds nothing between a document and its copy, even with keys and wire ends reordered', () => {
    const after = copy()
    after.wires = after.wires.map(([a, b]) => [b, a]).reverse()
    after.blocks[4]!.params = { at: 'f0', degrees: 90, impedance: 'Z0/sqrt(2)' }
    const diff = diffDocuments(branchLineHybrid, after)
    expect(diff.entries).toEqual([])
    expect(diff.counts).toEqual({ added: 0, removed: 0, changed: 0 })
  })

  it('lists a changed parameter value as written, with both values', () => {
    const after = copy()
    after.blocks.find(b => b.id === 'T12')!.params.impedance = 35.36
    expect(diffDocuments(branchLineHybrid, after).entries).toEqual([
      { area: 'parameter', change: 'changed', subject: 'T12.impedance', before: 'Z0/sqrt(2)', after: '35.36' },
    ])
  })

  it('lists added and removed parameters of a kept block', () => {
    const after = copy()
    const line = after.blocks.find(b => b.id === 'BR14')!
    line.params.lossDb = 0.05
    delete (line.params as Record<string, unknown>).at
    expect(diffDocuments(branchLineHybrid, after).entries).toEqual([
      { area: 'parameter', change: 'removed', subject: 'BR14.at', before: 'f0' },
      { area: 'parameter', change: 'added', subject: 'BR14.lossDb', after: '0.05' },
    ])
  })

  it('lists an added block with its wire, and a removed block with its wires', () => {
    const after = copy()
    after.blocks.push({ id: 'R4', type: 'load', params: { end: 'matched' } })
    after.wires.push(['P4.1', 'R4.1'])
    after.blocks = after.blocks.filter(b => b.id !== 'BR23')
    after.wires = after.wires.filter(w => !w.some(t => t.startsWith('BR23.')))
    const diff = diffDocuments(branchLineHybrid, after)
    expect(diff.entries).toEqual([
      { area: 'block', change: 'removed', subject: 'BR23', before: 'line' },
      { area: 'block', change: 'added', subject: 'R4', after: 'load' },
      { area: 'wire', change: 'removed', subject: 'BR23.1 – P2.1' },
      { area: 'wire', change: 'removed', subject: 'BR23.2 – P3.1' },
      { area: 'wire', change: 'added', subject: 'P4.1 – R4.1' },
    ])
    expect(diff.counts).toEqual({ added: 2, removed: 3, changed: 0 })
  })

  it('reports a retyped block and its parameter changes', () => {
    const after = copy()
    const block = after.blocks.find(b => b.id === 'T43')!
    block.type = 'stub'
    block.params.end = 'open'
    expect(diffDocuments(branchLineHybrid, after).entries).toEqual([
      { area: 'block', change: 'changed', subject: 'T43', before: 'line', after: 'stub' },
      { area: 'parameter', change: 'added', subject: 'T43.end', after: 'open' },
    ])
  })

  it('compares variables, sweep fields and document settings', () => {
    const after = copy()
    after.variables = { f0: '2.4 GHz', Zh: '35 ohm' }
    after.sweep = { ...after.sweep!, stop: '4 GHz' }
    after.referenceImpedance = 75
    expect(diffDocuments(branchLineHybrid, after).entries).toEqual([
      { area: 'variable', change: 'removed', subject: 'Z0', before: '50 ohm' },
      { area: 'variable', change: 'added', subject: 'Zh', after: '35 ohm' },
      { area: 'variable', change: 'changed', subject: 'f0', before: '2.45 GHz', after: '2.4 GHz' },
      { area: 'setting', change: 'changed', subject: 'referenceImpedance', before: '50', after: '75' },
      { area: 'setting', change: 'changed', subject: 'sweep.stop', before: '3.7 GHz', after: '4 GHz' },
    ])
  })

  it('keeps canvas moves out of the table and names the moved blocks', () => {
    const after = copy()
    after.blocks.find(b => b.id === 'P1')!.layout = { x: 40, y: 0, rotation: 90 }
    const diff = diffDocuments(branchLineHybrid, after)
    expect(diff.entries).toEqual([])
    expect(diff.movedOnly).toEqual(['P1'])
  })

  it('treats a renamed block as one removed and one added', () => {
    const after = copy()
    after.blocks.find(b => b.id === 'T12')!.id = 'TX'
    after.wires = after.wires.map(w => w.map(t => t.replace(/^T12\./, 'TX.')) as [string, string])
    const subjects = diffDocuments(branchLineHybrid, after).entries.map(e => `${e.change} ${e.area} ${e.subject}`)
    expect(subjects).toEqual([
      'removed block T12', 'added block TX',
      'removed wire P1.1 – T12.1', 'removed wire P2.1 – T12.2',
      'added wire P1.1 – TX.1', 'added wire P2.1 – TX.2',
    ])
  })
})
