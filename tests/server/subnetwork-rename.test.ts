// Renaming a network that others use as a sub-network: their blocks follow the new name, in the JSON and live.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { NetworkDocument } from '../../shared/network/types'
import { appUrl } from '../support/app'
import { newSignedInUser, type ApiClient } from '../support/http'
import { liveClient, synced, until, type LiveClient } from '../support/live'

const sweep = { start: '1 GHz', stop: '3 GHz', points: 3, spacing: 'linear' }
/** A matched 6 dB attenuator between two ports, named as given. */
const pad = (name: string): NetworkDocument => ({
  format: 'portwright.network', version: 1, name, referenceImpedance: 50, variables: { f0: '2 GHz' }, sweep,
  blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } }, { id: 'AT1', type: 'attenuator', params: { db: 6 } }],
  wires: [['P1.1', 'AT1.1'], ['AT1.2', 'P2.1']],
} as unknown as NetworkDocument)
/** A network using `inner` as a sub-network between its two ports. */
const user = (name: string, inner: string): NetworkDocument => ({
  format: 'portwright.network', version: 1, name, referenceImpedance: 50, variables: { f0: '2 GHz' }, sweep,
  blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } }, { id: 'SN1', type: 'subnetwork', params: { network: inner } }],
  wires: [['P1.1', 'SN1.1'], ['SN1.2', 'P2.1']],
} as unknown as NetworkDocument)

const reference = (d: NetworkDocument) => (d.blocks.find(b => b.id === 'SN1')!.params as { network: string }).network

describe('renaming a network used as a sub-network', () => {
  let owner: ApiClient
  let base = ''
  const clients: LiveClient[] = []

  beforeAll(async () => {
    owner = (await newSignedInUser('Rename Owner')).client
    const projectId = (await owner.post('/api/projects', { name: 'Renames' })).body.id
    base = `/api/projects/${projectId}`
  })
  afterAll(() => { for (const c of clients) c.destroy() })

  async function network(document: NetworkDocument): Promise<string> {
    const made = await owner.post(`${base}/networks`, { name: document.name, document })
    expect(made.status, JSON.stringify(made.body)).toBe(201)
    return made.body.id
  }
  async function stored(id: string): Promise<{ document: NetworkDocument, revision: number, name: string }> {
    return (await owner.get(`${base}/networks/${id}`)).body
  }
  /** 20·log10|S21| at the centre from a snapshot summary: −6 dB through the 6 dB attenuator (common practice). */
  async function solvesThrough(id: string): Promise<number> {
    const snap = await owner.post(`${base}/networks/${id}/snapshots`, { title: 'Check', allowUnsolved: false })
    expect(snap.status, JSON.stringify(snap.body)).toBe(201)
    return snap.body.summary.transfer[0].db
  }

  it('rewrites the users of the old name on a save through the API, and an open editor of a user sees it', async () => {
    const innerId = await network(pad('Pad A'))
    const firstId = await network(user('Uses A', 'Pad A'))
    const secondId = await network(user('Also uses A', 'Pad A'))
    const unrelatedId = await network(user('Uses something else', 'Elsewhere'))
    const live = liveClient(appUrl(), firstId, owner.cookie)
    clients.push(live)
    await synced(live)
    expect(reference(live.read())).toBe('Pad A')

    const before = await stored(innerId)
    const second = await stored(secondId)
    const renamed = await owner.put(`${base}/networks/${innerId}`, { revision: before.revision, document: { ...before.document, name: 'Pad A renamed' } })
    expect(renamed.status, JSON.stringify(renamed.body)).toBe(200)
    expect(renamed.body.name).toBe('Pad A renamed')

    expect(reference((await stored(secondId)).document)).toBe('Pad A renamed')
    expect((await stored(secondId)).revision).toBe(second.revision + 1)
    expect(reference((await stored(unrelatedId)).document)).toBe('Elsewhere')
    await until('the open editor takes the new reference in', () => reference(live.read()) === 'Pad A renamed')
    expect(reference((await stored(firstId)).document)).toBe('Pad A renamed')
    expect(await solvesThrough(firstId)).toBeCloseTo(-6, 9)
    expect(await solvesThrough(secondId)).toBeCloseTo(-6, 9)
  })

  it('follows a rename typed in a live editor once the live edits are merged', async () => {
    const innerId = await network(pad('Pad B'))
    const userId = await network(user('Uses B', 'Pad B'))
    const editor = liveClient(appUrl(), innerId, owner.cookie)
    clients.push(editor)
    await synced(editor)
    editor.edit((d) => { d.name = 'Pad B renamed' })
    await until('the rename is merged', async () => (await stored(innerId)).name === 'Pad B renamed', 20_000)
    await until('the user follows', async () => reference((await stored(userId)).document) === 'Pad B renamed', 10_000)
    expect(await solvesThrough(userId)).toBeCloseTo(-6, 9)
  })

  it('uses the network\'s id when an older network already has the new name, and leaves references meant for another network alone', async () => {
    await network(pad('Taken name'))
    const innerId = await network(pad('Pad C'))
    const userId = await network(user('Uses C', 'Pad C'))
    const before = await stored(innerId)
    expect((await owner.put(`${base}/networks/${innerId}`, { revision: before.revision, document: { ...before.document, name: 'Taken name' } })).status).toBe(200)
    // By name the older "Taken name" would win, so the block names this network by its id, which resolves to it alone.
    expect(reference((await stored(userId)).document)).toBe(innerId)
    expect(await solvesThrough(userId)).toBeCloseTo(-6, 9)

    // Two networks called "Twin": references to "Twin" mean the older one, so renaming the younger changes nothing.
    await network(pad('Twin'))
    const youngerId = await network(pad('Twin'))
    const twinUserId = await network(user('Uses Twin', 'Twin'))
    const younger = await stored(youngerId)
    expect((await owner.put(`${base}/networks/${youngerId}`, { revision: younger.revision, document: { ...younger.document, name: 'Twin junior' } })).status).toBe(200)
    expect(reference((await stored(twinUserId)).document)).toBe('Twin')
  })
})
