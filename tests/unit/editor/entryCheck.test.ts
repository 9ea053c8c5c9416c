import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { checkEntry, entryKey, entryTarget } from '../../../app/utils/editor/entryCheck'
import { blockIdProblem, checkNetworkName } from '../../../app/utils/editor/nameCheck'
import { plainWords, problemMessage } from '../../../app/utils/editor/problemWords'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import { useEditorStore } from '../../../app/stores/editor'
import { useDraftsStore } from '../../../app/stores/drafts'
import type { NetworkDocument } from '~~/shared/network/types'

function docWithLine(): NetworkDocument {
  const doc = emptyDocument('Draft test')
  doc.blocks.push({ id: 'TL1', type: 'line', params: { impedance: 50, degrees: 90, at: '1 GHz' } })
  return doc
}
const impedance = { kind: 'param', block: 'TL1', param: 'impedance' } as const

describe('entry check: what may enter the document', () => {
  it('takes values that evaluate, numbers as numbers and expressions as written', () => {
    expect(checkEntry(docWithLine(), impedance, '35.36')).toEqual({ ok: true, value: 35.36 })
    expect(checkEntry(docWithLine(), impedance, '50 ohm / sqrt(2)')).toEqual({ ok: true, value: '50 ohm / sqrt(2)' })
  })

  it('refuses an unknown name, an overflowing number and an empty required field, in the field\'s own words', () => {
    const abc = checkEntry(docWithLine(), impedance, 'abc')
    expect(abc.ok).toBe(false)
    expect(!abc.ok && abc.message).toBe('Impedance "abc" uses the unknown name abc')
    const huge = checkEntry(docWithLine(), impedance, '1e400')
    expect(!huge.ok && huge.message).toBe('Impedance (1e400) is too large to be a number')
    const empty = checkEntry(docWithLine(), impedance, '  ')
    expect(!empty.ok && empty.message).toBe('Impedance is empty: enter a value such as 50 Ω')
    const negative = checkEntry(docWithLine(), impedance, '-5')
    expect(!negative.ok && negative.message).toMatch(/^Impedance must be greater than zero/)
  })

  it('lets an optional parameter be cleared (its default applies)', () => {
    expect(checkEntry(docWithLine(), { kind: 'param', block: 'TL1', param: 'lossDb' }, '')).toEqual({ ok: true, value: undefined })
  })

  it('refuses fractional and non-numeric point counts instead of ignoring them', () => {
    const doc = docWithLine()
    const frac = checkEntry(doc, { kind: 'sweep', field: 'points' }, '2.5')
    expect(!frac.ok && frac.message).toBe('Number of points must be a whole number such as 201 (got 2.5)')
    expect(checkEntry(doc, { kind: 'sweep', field: 'points' }, 'abc').ok).toBe(false)
    expect(checkEntry(doc, { kind: 'sweep', field: 'points' }, '0').ok).toBe(false)
    expect(checkEntry(doc, { kind: 'sweep', field: 'points' }, '401')).toEqual({ ok: true, value: 401 })
  })

  it('names sweep ends with SI prefixes when they cross', () => {
    // The empty document sweeps 0.5 to 1.5 GHz.
    const stop = checkEntry(docWithLine(), { kind: 'sweep', field: 'stop' }, '400 MHz')
    expect(!stop.ok && stop.message).toBe('Stop frequency (400 MHz) must not be below the start frequency (500 MHz)')
  })

  it('checks a variable as a whole expression and names it', () => {
    const bad = checkEntry(docWithLine(), { kind: 'variable', name: 'f0' }, 'fc * 2')
    expect(!bad.ok && bad.message).toBe('Variable f0 "fc * 2" uses the unknown name fc')
    const empty = checkEntry(docWithLine(), { kind: 'variable', name: 'f0' }, '')
    expect(empty.ok).toBe(false)
  })

  it('round-trips targets through their keys', () => {
    for (const t of [impedance, { kind: 'variable', name: 'Z0' }, { kind: 'sweep', field: 'stop' }, { kind: 'reference' }] as const) {
      expect(entryTarget(entryKey(t))).toEqual(t)
    }
    expect(entryTarget('nonsense')).toBeNull()
  })
})

describe('names', () => {
  it('trims network names and refuses empty and overlong ones', () => {
    expect(checkNetworkName('  Feed A  ')).toEqual({ ok: true, name: 'Feed A' })
    expect(checkNetworkName('   ').ok).toBe(false)
    expect(checkNetworkName('x'.repeat(200)).ok).toBe(true)
    expect(checkNetworkName('x'.repeat(201)).ok).toBe(false)
  })

  it('limits block ids to 32 characters with a message', () => {
    const doc = docWithLine()
    expect(blockIdProblem(doc, 'TL1', 'A'.repeat(32))).toBeNull()
    expect(blockIdProblem(doc, 'TL1', 'A'.repeat(33))).toBe('The block name is too long: 33 characters, at most 32')
    expect(blockIdProblem(doc, 'TL1', '1st')).toMatch(/starts with a letter/)
  })
})

describe('problems in the user\'s words', () => {
  it('turns document field names and bare hertz into labels and SI prefixes', () => {
    expect(plainWords('sweep.stop (500000000 Hz) must not be below sweep.start (1000000000 Hz)'))
      .toBe('Stop frequency (500 MHz) must not be below start frequency (1 GHz)')
    expect(problemMessage({ block: 'TL1', field: 'impedance', message: 'block TL1 (line), impedance: "abc" uses the unknown name abc' }))
      .toBe('"abc" uses the unknown name abc')
  })
})

describe('drafts', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('keeps the last good value in the document until the draft evaluates, then writes it', () => {
    const editor = useEditorStore()
    editor.load(docWithLine())
    const drafts = useDraftsStore()
    drafts.open('')
    expect(drafts.enter(impedance, 'Zx')).toBe(false)
    expect(editor.doc.blocks[0]!.params.impedance).toBe(50)
    expect(drafts.draftOf(impedance)?.message).toBe('Impedance "Zx" uses the unknown name Zx')
    // Defining the variable the draft names lets it through on the next check.
    editor.setVariable('Zx', '70.7 ohm')
    drafts.recheck()
    expect(editor.doc.blocks[0]!.params.impedance).toBe('Zx')
    expect(drafts.draftOf(impedance)).toBeUndefined()
  })

  it('drops the draft of a block that was deleted, and writes nothing when read-only', () => {
    const editor = useEditorStore()
    editor.load(docWithLine())
    const drafts = useDraftsStore()
    drafts.enter(impedance, 'abc')
    editor.select(['TL1'])
    editor.deleteSelection()
    drafts.recheck()
    expect(drafts.draftOf(impedance)).toBeUndefined()
    editor.load(docWithLine(), { readOnly: true })
    expect(drafts.enter(impedance, '75')).toBe(false)
    expect(editor.doc.blocks[0]!.params.impedance).toBe(50)
  })
})

describe('blank entries', () => {
  it('are refused where the block needs a value, and clear a parameter whose absence means something', () => {
    const doc = docWithLine()
    const at = checkEntry(doc, { kind: 'param', block: 'TL1', param: 'at' }, '')
    expect(!at.ok && at.message).toBe('At frequency is empty: enter a value such as 2.45 GHz')
    doc.blocks.push({ id: 'RL1', type: 'load', params: { resistance: 50 } })
    expect(checkEntry(doc, { kind: 'param', block: 'RL1', param: 'capacitance' }, '')).toEqual({ ok: true, value: undefined })
  })
})

describe('drafts across a reload', () => {
  it('come back from the tab\'s session storage for the same network only, with their message', () => {
    const items = new Map<string, string>()
    const storage = {
      get length() { return items.size },
      key: (i: number) => [...items.keys()][i] ?? null,
      getItem: (k: string) => items.get(k) ?? null,
      setItem: (k: string, v: string) => { items.set(k, v) },
      removeItem: (k: string) => { items.delete(k) },
      clear: () => items.clear(),
    }
    ;(globalThis as { sessionStorage?: unknown }).sessionStorage = storage
    try {
      setActivePinia(createPinia())
      useEditorStore().load(docWithLine())
      useDraftsStore().open('network-a')
      useDraftsStore().enter(impedance, 'abc')
      expect([...items.keys()]).toEqual(['portwright:draft:network-a:block:TL1:impedance'])

      // A reload: fresh stores, the same tab's storage.
      setActivePinia(createPinia())
      useEditorStore().load(docWithLine())
      const drafts = useDraftsStore()
      drafts.open('network-a')
      expect(drafts.draftOf(impedance)).toEqual({ text: 'abc', message: 'Impedance "abc" uses the unknown name abc' })
      expect(useEditorStore().doc.blocks[0]!.params.impedance).toBe(50)
      drafts.open('network-b')
      expect(drafts.draftOf(impedance)).toBeUndefined()
    }
    finally {
      delete (globalThis as { sessionStorage?: unknown }).sessionStorage
    }
  })
})

describe('drafts follow their block', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('when it is renamed', () => {
    const editor = useEditorStore()
    editor.load(docWithLine())
    const drafts = useDraftsStore()
    drafts.enter(impedance, 'abc')
    drafts.renameBlock('TL1', 'Arm')
    editor.renameBlock('TL1', 'Arm')
    drafts.recheck()
    expect(drafts.draftOf({ kind: 'param', block: 'Arm', param: 'impedance' })?.text).toBe('abc')
    expect(drafts.draftOf(impedance)).toBeUndefined()
  })
})
