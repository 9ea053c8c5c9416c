/**
 * The editor store on a Yjs-backed document source: local edits become Yjs
 * transactions another replica receives, remote edits reach the store, and
 * undo/redo take back only the local user's own changes.
 */
import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import * as Y from 'yjs'
import { useEditorStore } from '../../../app/stores/editor'
import { createLiveSource } from '../../../app/composables/useLiveNetwork'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import { networkToYDoc, readNetwork, writeNetwork } from '../../../shared/live/network-ydoc'

/** Two replicas wired to each other directly, as the server would relay them. */
function pair() {
  const a = networkToYDoc(emptyDocument('Shared'))
  const b = new Y.Doc()
  Y.applyUpdate(b, Y.encodeStateAsUpdate(a))
  a.on('update', (u: Uint8Array, origin: unknown) => { if (origin !== 'relay') Y.applyUpdate(b, u, 'relay') })
  b.on('update', (u: Uint8Array, origin: unknown) => { if (origin !== 'relay') Y.applyUpdate(a, u, 'relay') })
  return { a, b }
}

function remoteEdit(doc: Y.Doc, change: (d: ReturnType<typeof readNetwork>) => void) {
  const next = readNetwork(doc)
  change(next)
  doc.transact(() => writeNetwork(doc, next), 'someone-else')
}

describe('live document source', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('sends store edits as Yjs transactions and shows remote edits in the store', () => {
    const { a, b } = pair()
    const store = useEditorStore()
    store.load(readNetwork(a), { source: createLiveSource(a) })
    const id = store.addBlock('line', { x: 40, y: 40 })!
    expect(readNetwork(b).blocks.map(x => x.id)).toEqual([id])
    remoteEdit(b, (d) => { d.blocks[0]!.params.impedance = 35.36 })
    expect(store.doc.blocks[0]!.params.impedance).toBe(35.36)
    expect(store.lastOrigin).toBe('remote')
  })

  it('undoes only the local user\'s changes, leaving a colleague\'s edit in place', () => {
    const { a, b } = pair()
    const store = useEditorStore()
    store.load(readNetwork(a), { source: createLiveSource(a) })
    const mine = store.addBlock('port', { x: 0, y: 0 })!
    remoteEdit(b, (d) => { d.blocks.push({ id: 'THEIRS', type: 'load', params: { resistance: 50 } }) })
    remoteEdit(b, (d) => { d.name = 'Renamed by a colleague' })
    expect(store.history.canUndo).toBe(true)
    store.undo()
    expect(store.doc.blocks.map(x => x.id)).toEqual(['THEIRS'])
    expect(store.doc.name).toBe('Renamed by a colleague')
    expect(readNetwork(b).blocks.map(x => x.id)).toEqual(['THEIRS'])
    expect(store.lastOrigin).toBe('undo')
    store.redo()
    expect(store.doc.blocks.map(x => x.id).sort()).toEqual([mine, 'THEIRS'].sort())
    expect(store.lastOrigin).toBe('redo')
  })

  it('makes typing into one field one undo step, and separate fields separate steps', () => {
    const { a } = pair()
    let clock = 0
    const store = useEditorStore()
    store.load(readNetwork(a), { source: createLiveSource(a, { now: () => clock, mergeWindowMs: 1000 }) })
    const id = store.addBlock('line', { x: 0, y: 0 })!
    clock += 5000
    for (const z of ['3', '35', '35.4']) { store.setParam(id, 'impedance', z); clock += 100 }
    clock += 5000
    store.setName('Other name')
    store.undo()
    expect(store.doc.name).not.toBe('Other name')
    expect(store.doc.blocks[0]!.params.impedance).toBe('35.4')
    store.undo()
    expect(store.doc.blocks[0]!.params.impedance).not.toBe('3')
    expect(store.doc.blocks).toHaveLength(1)
  })

  it('a read-only store sends nothing', () => {
    const { a, b } = pair()
    const store = useEditorStore()
    store.load(readNetwork(a), { source: createLiveSource(a), readOnly: true })
    const before = Y.encodeStateVector(b)
    store.addBlock('port', { x: 0, y: 0 })
    expect(Y.encodeStateVector(b)).toEqual(before)
  })
})
