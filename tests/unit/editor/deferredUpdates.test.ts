import { describe, expect, it } from 'vitest'
import * as Y from 'yjs'
import { DEFERRED_ORIGIN, deferLocalUpdates } from '../../../app/utils/editor/deferredUpdates'

/** A document with two listeners standing in for the connection and the offline copy, and a hand-run scheduler. */
function setup() {
  const doc = new Y.Doc()
  const sent: Array<{ update: Uint8Array, origin: unknown }> = []
  const stored: Array<{ update: Uint8Array, origin: unknown }> = []
  const connection = (update: Uint8Array, origin: unknown) => { sent.push({ update, origin }) }
  const offline = (update: Uint8Array, origin: unknown) => { stored.push({ update, origin }) }
  doc.on('update', connection)
  doc.on('update', offline)
  const queue: Array<() => void> = []
  const remoteOrigin = { connection: true }
  const deferred = deferLocalUpdates(doc, [connection, offline], { immediateOrigins: new Set([remoteOrigin]), schedule: run => queue.push(run) })
  const runScheduled = () => { for (const run of queue.splice(0)) run() }
  return { doc, sent, stored, queue, runScheduled, deferred, remoteOrigin, connection }
}

/** A fresh document built from these updates, read back. */
function replay(updates: Uint8Array[]) {
  const copy = new Y.Doc()
  for (const u of updates) Y.applyUpdate(copy, u)
  return copy.getMap('m').toJSON()
}

describe('local edits handed to co-editing and the offline copy after the frame', () => {
  it('holds local updates until the scheduled moment, then hands both listeners one merged update', () => {
    const { doc, sent, stored, queue, runScheduled } = setup()
    const map = doc.getMap('m')
    for (let k = 0; k < 5; k++) doc.transact(() => map.set('impedance', 35 + k), { local: true })
    expect(sent).toHaveLength(0)
    expect(stored).toHaveLength(0)
    expect(queue).toHaveLength(1) // one wait for five edits
    runScheduled()
    expect(sent).toHaveLength(1)
    expect(stored).toHaveLength(1)
    expect(sent[0]!.origin).toBe(DEFERRED_ORIGIN)
    expect(replay(sent.map(s => s.update))).toEqual({ impedance: 39 })
  })

  it('passes updates from the connection through at once, after the local ones that were waiting', () => {
    const { doc, sent, stored, remoteOrigin } = setup()
    doc.transact(() => doc.getMap('m').set('mine', 1), { local: true })
    // A peer's edit, as the connection applies it.
    const peer = new Y.Doc()
    peer.getMap('m').set('theirs', 2)
    Y.applyUpdate(doc, Y.encodeStateAsUpdate(peer), remoteOrigin)
    expect(sent.map(s => s.origin)).toEqual([DEFERRED_ORIGIN, remoteOrigin])
    expect(stored.map(s => s.origin)).toEqual([DEFERRED_ORIGIN, remoteOrigin])
    expect(replay(stored.map(s => s.update))).toEqual({ mine: 1, theirs: 2 })
  })

  it('flushes on demand, and gives the listeners back on dispose', () => {
    const { doc, sent, deferred, runScheduled } = setup()
    const map = doc.getMap('m')
    map.set('a', 1)
    deferred.flush()
    expect(sent).toHaveLength(1)
    runScheduled() // nothing left to hand over
    expect(sent).toHaveLength(1)
    map.set('b', 2)
    deferred.dispose() // the waiting edit goes first
    expect(sent).toHaveLength(2)
    map.set('c', 3) // then straight through, inside the edit, as without deferral
    expect(sent).toHaveLength(3)
    expect(sent[2]!.origin).toBeNull()
    expect(replay(sent.map(s => s.update))).toEqual({ a: 1, b: 2, c: 3 })
  })
})
