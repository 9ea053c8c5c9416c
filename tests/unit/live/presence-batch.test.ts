/**
 * Presence batching of the live server: changes within one window go out
 * once, with the latest state of each client; groups for the notifications
 * between instances stay under the size asked for and lose nobody. The
 * awareness encoding is y-protocols' own, so a joint update decoded by its
 * applyAwarenessUpdate must give every state sent.
 */
import { afterEach, describe, expect, it, vi } from 'vitest'
import * as Y from 'yjs'
import * as awarenessProtocol from 'y-protocols/awareness'
import { PresenceBatch, presenceGroups } from '../../../server/live/presence-batch'

afterEach(() => { vi.useRealTimers() })

/** An awareness holding `count` remote states of about `bytes` characters each. */
function awarenessWith(count: number, bytes: number): { awareness: awarenessProtocol.Awareness, ids: number[] } {
  const source = new awarenessProtocol.Awareness(new Y.Doc())
  const target = new awarenessProtocol.Awareness(new Y.Doc())
  target.setLocalState(null)
  const ids: number[] = []
  for (let k = 0; k < count; k++) {
    const id = 1000 + k
    source.states.set(id, { selection: ['x'.repeat(bytes)], k })
    source.meta.set(id, { clock: 1, lastUpdated: Date.now() })
    ids.push(id)
  }
  awarenessProtocol.applyAwarenessUpdate(target, awarenessProtocol.encodeAwarenessUpdate(source, ids), 'test')
  source.destroy()
  return { awareness: target, ids }
}

describe('PresenceBatch', () => {
  it('sends every change of one window once, and what came from this instance\'s peers apart', () => {
    vi.useFakeTimers()
    const sent: Array<[number[], number[]]> = []
    const batch = new PresenceBatch(50, (changed, local) => sent.push([changed, local]))
    batch.add([1, 2], true)
    batch.add([2, 3], false)
    batch.add([1], true)
    vi.advanceTimersByTime(49)
    expect(sent).toEqual([])
    vi.advanceTimersByTime(1)
    expect(sent).toEqual([[[1, 2, 3], [1, 2]]])
    batch.add([4], false)
    vi.advanceTimersByTime(50)
    expect(sent).toEqual([[[1, 2, 3], [1, 2]], [[4], []]])
  })

  it('sends at once on flush, nothing for an empty window, and nothing after dispose', () => {
    vi.useFakeTimers()
    const sent: number[][] = []
    const batch = new PresenceBatch(50, changed => sent.push(changed))
    batch.add([], true)
    batch.flush()
    vi.advanceTimersByTime(100)
    expect(sent).toEqual([])
    batch.add([7], true)
    batch.flush()
    expect(sent).toEqual([[7]])
    batch.add([8], true)
    batch.dispose()
    vi.advanceTimersByTime(100)
    expect(sent).toEqual([[7]])
  })
})

describe('presenceGroups', () => {
  it('splits 200 states into groups under the size, each a valid update carrying its states', () => {
    const { awareness, ids } = awarenessWith(200, 120)
    const groups = presenceGroups(awareness, ids, 5000)
    expect(groups.flat()).toEqual(ids)
    expect(groups.length).toBeGreaterThan(1)
    const reader = new awarenessProtocol.Awareness(new Y.Doc())
    for (const group of groups) {
      const update = awarenessProtocol.encodeAwarenessUpdate(awareness, group)
      expect(update.length).toBeLessThanOrEqual(5000)
      awarenessProtocol.applyAwarenessUpdate(reader, update, 'test')
    }
    for (const id of ids) expect(reader.getStates().get(id)).toEqual(awareness.getStates().get(id))
  })

  it('gives an over-size state a group of its own and leaves out clients never seen', () => {
    const { awareness, ids } = awarenessWith(3, 6000)
    expect(presenceGroups(awareness, [...ids, 99], 5000)).toEqual(ids.map(id => [id]))
    expect(presenceGroups(awareness, [], 5000)).toEqual([])
  })
})
