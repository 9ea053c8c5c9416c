// Undo and redo flags change only when they do: a new object on every edit re-renders every bar that shows them.
import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { useEditorStore } from '../../../app/stores/editor'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'

describe('undo and redo flags of the editor store', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('keep their object while edits leave them as they were, and follow undo and redo', () => {
    const s = useEditorStore()
    s.load(emptyDocument('Flags'))
    expect(s.history).toEqual({ canUndo: false, canRedo: false })
    s.addBlock('line', { x: 0, y: 0 })
    const afterFirst = s.history
    expect(afterFirst).toEqual({ canUndo: true, canRedo: false })
    s.setParam('LN1', 'impedance', '40 ohm')
    s.setParam('LN1', 'impedance', '41 ohm')
    expect(s.history).toBe(afterFirst)
    s.undo()
    expect(s.history).toEqual({ canUndo: true, canRedo: true })
    s.redo()
    expect(s.history).toEqual({ canUndo: true, canRedo: false })
  })
})
