// Live updates are tried on a scratch copy and the result read strictly before they are logged (OWASP ASVS 5.0,
// V2: validate all input). Each case names the attack; the fuzz case mutates real updates at random.
import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import * as Y from 'yjs'
import { NETWORK_ROOT, networkToYDoc, readNetwork, writeNetwork } from '../../../shared/live/network-ydoc'
import { checkUpdateOn } from '../../../shared/live/strict-read'
import { parseNetworkDocument } from '../../../shared/network/schema'
import type { NetworkDocument } from '../../../shared/network/types'
import { pick, seededRandom } from '../../support/seeded-random'

const example = JSON.parse(readFileSync(join(process.cwd(), 'shared', 'examples', 'branch-line-hybrid.json'), 'utf8')) as NetworkDocument

/** A client replica of the server's document, and the update one change on it makes. */
function clientUpdate(server: Y.Doc, change: (client: Y.Doc) => void): Uint8Array {
  const client = new Y.Doc()
  Y.applyUpdate(client, Y.encodeStateAsUpdate(server))
  const before = Y.encodeStateVector(client)
  change(client)
  const update = Y.encodeStateAsUpdate(client, before)
  client.destroy()
  return update
}
const values = (doc: Y.Doc) => doc.getMap(NETWORK_ROOT).get('v') as Y.Map<unknown>

describe('live updates read strictly', () => {
  it('an honest edit passes and the server copy is untouched by the check', () => {
    const server = networkToYDoc(example)
    const update = clientUpdate(server, client => writeNetwork(client, { ...readNetwork(client), name: 'Renamed' }))
    const checked = checkUpdateOn(server, update)
    expect(checked.ok && checked.document.name).toBe('Renamed')
    expect(readNetwork(server).name).toBe(example.name)
  })

  it('attack: a non-array under `blocks` made every later merge fail', () => {
    const server = networkToYDoc(example)
    const update = clientUpdate(server, client => values(client).set('blocks', 'not a list'))
    const checked = checkUpdateOn(server, update)
    expect(checked.ok).toBe(false)
    if (!checked.ok) expect(checked.reason).toMatch(/blocks/)
  })

  it('attack: a text type where the mapping writes plain values', () => {
    const server = networkToYDoc(example)
    const update = clientUpdate(server, client => values(client).set('name', new Y.Text('sneaky')))
    const checked = checkUpdateOn(server, update)
    expect(checked).toEqual({ ok: false, reason: 'name is a Text type, which a network document cannot hold' })
  })

  it('attack: binary data and stray entries beside the mapping', () => {
    const server = networkToYDoc(example)
    expect(checkUpdateOn(server, clientUpdate(server, c => values(c).set('extra', new Uint8Array(4)))).ok).toBe(false)
    expect(checkUpdateOn(server, clientUpdate(server, c => c.getMap(NETWORK_ROOT).set('x', 1)))).toEqual({ ok: false, reason: 'the document has the stray entry "x"' })
  })

  it('attack: garbage bytes as an update', () => {
    const server = networkToYDoc(example)
    const checked = checkUpdateOn(server, new Uint8Array([1, 2, 3, 4, 5, 250, 251]))
    expect(checked.ok).toBe(false)
  })

  it('fuzz: 3,000 mutated updates never throw, and whatever passes is a valid document', () => {
    const random = seededRandom(4242)
    const server = networkToYDoc(example)
    const honest = [
      clientUpdate(server, c => writeNetwork(c, { ...readNetwork(c), name: 'Fuzzed' })),
      clientUpdate(server, c => writeNetwork(c, { ...readNetwork(c), blocks: readNetwork(c).blocks.slice(1) })),
      clientUpdate(server, c => values(c).set('wires', new Y.Array())),
      clientUpdate(server, c => values(c).set('variables', 7)),
    ]
    let passed = 0
    for (let i = 0; i < 3_000; i++) {
      const update = new Uint8Array(pick(random, honest))
      const flips = 1 + Math.floor(random() * 4)
      for (let f = 0; f < flips && random() < 0.9; f++) update[Math.floor(random() * update.length)] = Math.floor(random() * 256)
      const checked = checkUpdateOn(server, update)
      if (checked.ok) {
        passed++
        expect(parseNetworkDocument(checked.document).ok).toBe(true)
      } else {
        expect(typeof checked.reason).toBe('string')
      }
    }
    expect(passed).toBeGreaterThan(0)
    expect(readNetwork(server)).toEqual(example)
  })
})
