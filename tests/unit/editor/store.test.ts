import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { useEditorStore } from '../../../app/stores/editor'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import type { NetworkDocument } from '~~/shared/network/types'

function store() {
  const s = useEditorStore()
  s.load(emptyDocument('Test'))
  return s
}

describe('editor store', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('adds blocks with fresh ids and consecutive port numbers', () => {
    const s = store()
    const p1 = s.addBlock('port', { x: 0, y: 0 })
    const p2 = s.addBlock('port', { x: 0, y: 80 })
    const l = s.addBlock('line', { x: 80, y: 0 })
    expect([p1, p2, l]).toEqual(['P1', 'P2', 'LN1'])
    expect(s.doc.blocks.map(b => b.params.index)).toEqual([1, 2, undefined])
    expect(s.selection.blocks).toEqual(['LN1'])
  })

  it('wires terminals and refuses duplicates, self-wires and missing terminals', () => {
    const s = store()
    s.addBlock('port', { x: 0, y: 0 })
    s.addBlock('line', { x: 80, y: 0 })
    expect(s.connect('P1.1', 'LN1.1')).toBe(true)
    expect(s.connect('LN1.1', 'P1.1')).toBe(false)
    expect(s.connect('LN1.1', 'LN1.1')).toBe(false)
    expect(s.connect('LN1.3', 'P1.1')).toBe(false)
    expect(s.connect('P1.2', 'LN1.2')).toBe(false)
    expect(s.doc.wires).toEqual([['P1.1', 'LN1.1']])
  })

  it('rotates a block a quarter turn and back, keeping it on the grid', () => {
    const s = store()
    s.addBlock('line', { x: 100, y: 100 })
    s.rotateSelection(1)
    expect(s.doc.blocks[0]!.layout).toEqual({ x: 120, y: 80, rotation: 90, flip: false })
    s.rotateSelection(-1)
    expect(s.doc.blocks[0]!.layout).toEqual({ x: 100, y: 100, rotation: 0, flip: false })
    s.flipSelection()
    expect(s.doc.blocks[0]!.layout?.flip).toBe(true)
  })

  it('deletes a block together with its wires and closes port numbering gaps', () => {
    const s = store()
    s.addBlock('port', { x: 0, y: 0 })
    s.addBlock('port', { x: 0, y: 80 })
    s.addBlock('port', { x: 0, y: 160 })
    s.addBlock('line', { x: 80, y: 0 })
    s.connect('P2.1', 'LN1.1')
    s.connect('P3.1', 'LN1.2')
    s.select(['P2'])
    s.deleteSelection()
    expect(s.doc.blocks.map(b => b.id)).toEqual(['P1', 'P3', 'LN1'])
    expect(s.doc.blocks.find(b => b.id === 'P3')!.params.index).toBe(2)
    expect(s.doc.wires).toEqual([['P3.1', 'LN1.2']])
    expect(s.selection.blocks).toEqual([])
  })

  it('undoes and redoes every kind of edit in order', () => {
    const s = store()
    const states: string[] = [JSON.stringify(s.doc)]
    const steps = [
      () => s.addBlock('port', { x: 0, y: 0 }),
      () => s.addBlock('line', { x: 80, y: 0 }),
      () => s.connect('P1.1', 'LN1.1'),
      () => s.rotateSelection(1),
      () => s.setParam('LN1', 'impedance', 'Z0/sqrt(2)'),
      () => s.moveBlocks({ P1: { x: 40, y: 40 } }),
      () => { s.select(['P1']); s.deleteSelection() },
    ]
    for (const step of steps) {
      step()
      states.push(JSON.stringify(s.doc))
    }
    for (let i = states.length - 2; i >= 0; i--) {
      s.undo()
      expect(JSON.stringify(s.doc)).toBe(states[i])
    }
    expect(s.history.canUndo).toBe(false)
    for (let i = 1; i < states.length; i++) {
      s.redo()
      expect(JSON.stringify(s.doc)).toBe(states[i])
    }
    expect(s.history.canRedo).toBe(false)
  })

  it('collapses typing in one field into one undo step', () => {
    const s = store()
    s.addBlock('line', { x: 0, y: 0 })
    for (const v of ['3', '35', '35.', '35.3']) s.setParam('LN1', 'impedance', v)
    expect(s.doc.blocks[0]!.params.impedance).toBe('35.3')
    s.undo()
    expect(s.doc.blocks[0]!.params.impedance).toBe(50)
  })

  it('copies and pastes blocks with the wires between them under new ids', () => {
    const s = store()
    s.addBlock('port', { x: 0, y: 0 })
    s.addBlock('line', { x: 80, y: 0 })
    s.connect('P1.1', 'LN1.1')
    s.select(['P1', 'LN1'])
    s.duplicateSelection()
    expect(s.doc.blocks.map(b => b.id)).toEqual(['P1', 'LN1', 'P2', 'LN2'])
    expect(s.doc.blocks[2]!.params.index).toBe(2)
    expect(s.doc.wires).toEqual([['P1.1', 'LN1.1'], ['P2.1', 'LN2.1']])
    expect(s.selection.blocks).toEqual(['P2', 'LN2'])
  })

  it('is read-only for viewers: edits are ignored', () => {
    const s = useEditorStore()
    s.load(emptyDocument('Frozen'), { readOnly: true })
    expect(s.addBlock('port', { x: 0, y: 0 })).toBeUndefined()
    expect(s.doc.blocks).toEqual([])
  })

  it('round-trips a document: load then save gives the same JSON, minus dangling wires', () => {
    const input = {
      ...emptyDocument('Round trip'),
      variables: { f0: '2.45 GHz', Z0: '50 ohm' },
      substrates: { core: { permittivity: 3.5, height: '0.5 mm', thickness: '35 um', lossTangent: 0.003, conductivity: 5.8e7 } },
      blocks: [
        { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0, rotation: 0, flip: false } },
        { id: 'TA', type: 'line', params: { impedance: 'Z0/sqrt(2)', degrees: 90, at: 'f0' } },
        { id: 'X', type: 'data', params: { file: 'abc' }, extra: { kept: true } },
      ],
      wires: [['P1.1', 'TA.1'], ['TA.2', 'GONE.1'], ['TA.3', 'P1.1'], ['X.7', 'TA.2']],
    } as unknown as NetworkDocument
    const s = useEditorStore()
    s.load(input)
    const saved = JSON.parse(JSON.stringify(s.savedDocument()))
    expect(saved).toEqual({ ...JSON.parse(JSON.stringify(input)), wires: [['P1.1', 'TA.1'], ['X.7', 'TA.2']] })
  })
})
