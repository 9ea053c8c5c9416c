import { describe, expect, it } from 'vitest'
import { bindingFor, comboOf, keymap } from '../../../app/utils/editor/keymap'

const key = (k: string, mods: Partial<{ ctrlKey: boolean, metaKey: boolean, altKey: boolean, shiftKey: boolean, code: string }> = {}) =>
  ({ key: k, ctrlKey: false, metaKey: false, altKey: false, shiftKey: false, ...mods })

describe('key scheme', () => {
  it('gives every combo exactly one action', () => {
    const combos = keymap.flatMap(b => b.combos)
    expect(new Set(combos).size).toBe(combos.length)
  })

  it('reads modifiers, treating Ctrl and ⌘ alike', () => {
    expect(bindingFor(key('z', { ctrlKey: true }))?.action).toBe('undo')
    expect(bindingFor(key('Z', { metaKey: true, shiftKey: true }))?.action).toBe('redo')
    expect(bindingFor(key('T', { shiftKey: true }))?.action).toBe('turnAnticlockwise')
    expect(bindingFor(key('t'))?.action).toBe('turnClockwise')
    expect(bindingFor(key('?', { shiftKey: true }))?.action).toBe('help')
    expect(bindingFor(key('x'))).toBeUndefined()
  })

  it('takes Alt+digit from the key code, whatever character the layout produces', () => {
    expect(comboOf(key('¡', { altKey: true, code: 'Digit1' }))).toBe('alt+1')
    expect(bindingFor(key('™', { altKey: true, code: 'Digit2' }))?.action).toBe('viewSmith')
  })
})
