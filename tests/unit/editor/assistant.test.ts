import { describe, expect, it } from 'vitest'
import { placeDesign, previewDesign } from '../../../app/utils/editor/assistant'
import { pasteFragment } from '../../../app/utils/editor/documentOps'
import { branchLineHybrid } from '../../../shared/examples/index'
import { parseNetworkDocument } from '../../../shared/network/index'
import { solveDocument } from '../../../shared/solver/index'
import type { NetworkDocument } from '../../../shared/network/types'

describe('design assistant dialog (pure parts)', () => {
  it('previews the solved design: its spec band and every condition holding over it', () => {
    const preview = previewDesign('quadrature', { frequency: '2.45 GHz', impedance: '50 ohm', sections: '2' })
    expect(preview.ok).toBe(true)
    if (!preview.ok) return
    expect(preview.center).toBeCloseTo(2.45e9, 0)
    expect(preview.band!.fractional).toBeGreaterThan(0.1)
    expect(preview.reach!.fractional).toBeGreaterThanOrEqual(preview.band!.fractional)
    expect(preview.conditions.map(c => c.text)).toContain('return loss at port 1 ≥ 20 dB')
    for (const c of preview.conditions) expect(c.worstMargin).toBeGreaterThanOrEqual(0)
    expect(preview.conditions.find(c => c.text.startsWith('phase'))!.unit).toBe('°')
    expect(preview.conditions.find(c => c.text.startsWith('return loss'))!.unit).toBe(' dB')
  })

  it('names the option for bad or missing input; blank fields count as not given', () => {
    const preview = previewDesign('transformer', { frequency: '1 GHz', impedance: ' ', load: '100 m', sections: '2', response: 'binomial' })
    expect(preview.ok).toBe(false)
    if (preview.ok) return
    expect(preview.problems.map(p => p.option).sort()).toEqual(['impedance', 'load'])
  })

  it('an empty network becomes the design, keeping its own name', () => {
    const design = previewDesign('ring', { frequency: '1 GHz', impedance: '50' })
    if (!design.ok) throw new Error('ring design failed')
    const empty: NetworkDocument = { format: 'portwright.network', version: 1, name: 'Feed for the Quillmere test range', blocks: [], wires: [] }
    const placement = placeDesign(empty, design.document)
    expect(placement.mode).toBe('replace')
    if (placement.mode !== 'replace') return
    expect(placement.document.name).toBe('Feed for the Quillmere test range')
    expect(placement.document.spec).toEqual(design.document.spec)
  })

  it('into a non-empty network: values written out, placed to the right, ports numbered after the existing ones, same response', () => {
    const design = previewDesign('coupled-line', { 'frequency': '3 GHz', 'impedance': '50', 'coupling-db': '10' })
    if (!design.ok) throw new Error('coupled-line design failed')
    const current = structuredClone(branchLineHybrid) as NetworkDocument
    const placement = placeDesign(current, design.document)
    expect(placement.mode).toBe('add')
    if (placement.mode !== 'add') return
    expect(placement.version).toBe(1.1)
    const coupled = placement.fragment.blocks.find(b => b.type === 'coupled')!
    expect(typeof coupled.params.evenImpedance).toBe('number')
    expect(coupled.params.at).toBe(3e9)
    expect(placement.offset.x).toBeGreaterThan(Math.max(...current.blocks.map(b => b.layout!.x)))
    const ids = pasteFragment(current, placement.fragment, placement.offset)
    current.version = placement.version!
    expect(ids).toHaveLength(design.document.blocks.length)
    expect(current.blocks.filter(b => b.type === 'port').map(b => b.params.index).sort()).toEqual([1, 2, 3, 4, 5, 6, 7, 8])
    expect(parseNetworkDocument(current).ok).toBe(true)
    // The added group alone, solved, is the designed coupler: |S31| = −10 dB at 3 GHz.
    const added = { ...design.document, blocks: placement.fragment.blocks, wires: placement.fragment.wires, variables: {} }
    const solved = solveDocument(added, { sweep: { start: 3e9, stop: 3e9, points: 1 } })
    expect(solved.ok).toBe(true)
    if (!solved.ok) return
    expect(20 * Math.log10(Math.hypot(solved.result.re[8]!, solved.result.im[8]!))).toBeCloseTo(-10, 6)
  })
})
