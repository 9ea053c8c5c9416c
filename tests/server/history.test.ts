import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { branchLineHybrid } from '../../shared/examples/index'
import type { NetworkDocument } from '../../shared/network/types'
import type { CheckpointDto, CheckpointListItemDto } from '../../shared/types/history'
import { appUrl } from '../support/app'
import { newSignedInUser, type ApiClient } from '../support/http'
import { liveClient, synced, until, type LiveClient } from '../support/live'

type Person = Awaited<ReturnType<typeof newSignedInUser>>
let owner: Person, editor: Person, viewer: Person
let base: string
let db: pg.Client
const liveClients: LiveClient[] = []

async function newNetwork(name: string, document: NetworkDocument = branchLineHybrid): Promise<string> {
  const made = await editor.client.post(`${base}/networks`, { name, document })
  expect(made.status, JSON.stringify(made.body)).toBe(201)
  return made.body.id
}

async function network(networkId: string): Promise<{ document: NetworkDocument; revision: number }> {
  const answer = await owner.client.get(`${base}/networks/${networkId}`)
  expect(answer.status).toBe(200)
  return answer.body
}

async function save(client: ApiClient, networkId: string, change: (d: NetworkDocument) => void) {
  const current = await network(networkId)
  const document = structuredClone(current.document)
  change(document)
  const answer = await client.put(`${base}/networks/${networkId}`, { revision: current.revision, document })
  expect(answer.status, JSON.stringify(answer.body)).toBe(200)
  return answer.body
}

async function checkpoints(networkId: string, client: ApiClient = viewer.client): Promise<CheckpointListItemDto[]> {
  const answer = await client.get(`${base}/networks/${networkId}/checkpoints`)
  expect(answer.status, JSON.stringify(answer.body)).toBe(200)
  return answer.body
}

async function checkpoint(networkId: string, id: string): Promise<CheckpointDto> {
  const answer = await viewer.client.get(`${base}/networks/${networkId}/checkpoints/${id}`)
  expect(answer.status, JSON.stringify(answer.body)).toBe(200)
  return answer.body
}

const impedanceOf = (d: NetworkDocument, id = 'T12') => d.blocks.find(b => b.id === id)!.params.impedance
const setImpedance = (value: number) => (d: NetworkDocument) => { d.blocks.find(b => b.id === 'T12')!.params.impedance = value }

beforeAll(async () => {
  owner = await newSignedInUser('Hana Owner')
  editor = await newSignedInUser('Emil Editor')
  viewer = await newSignedInUser('Vik Viewer')
  const project = await owner.client.post('/api/projects', { name: 'History bench' })
  base = `/api/projects/${project.body.id}`
  for (const [p, role] of [[editor, 'editor'], [viewer, 'viewer']] as const) await owner.client.post(`${base}/members`, { email: p.email, role })
  db = new pg.Client({ connectionString: process.env.PORTWRIGHT_TEST_DATABASE_URL })
  await db.connect()
})

afterAll(async () => {
  for (const c of liveClients) c.destroy()
  await db?.end()
})

describe('history checkpoints', () => {
  it('a save through the API is a checkpoint with who, when, why and its size; the document it replaced is kept once', async () => {
    const networkId = await newNetwork('Saved twice')
    expect(await checkpoints(networkId)).toEqual([])
    const saved = await save(editor.client, networkId, setImpedance(36))
    const list = await checkpoints(networkId)
    expect(list.map(c => c.reason)).toEqual(['save', 'before-change'])
    expect(list[0]).toMatchObject({ revision: saved.revision, blockCount: branchLineHybrid.blocks.length })
    expect(list[0]!.editors.map(p => p.name)).toEqual(['Emil Editor'])
    expect(Date.now() - Date.parse(list[0]!.createdAt)).toBeLessThan(60_000)
    expect(list[0]).not.toHaveProperty('document')
    expect(impedanceOf((await checkpoint(networkId, list[0]!.id)).document)).toBe(36)
    expect(impedanceOf((await checkpoint(networkId, list[1]!.id)).document)).toBe('Z0/sqrt(2)')
    // The second save replaces what the newest checkpoint already holds: one new checkpoint, no copy.
    await save(owner.client, networkId, setImpedance(40))
    const again = await checkpoints(networkId)
    expect(again.map(c => c.reason)).toEqual(['save', 'save', 'before-change'])
    expect(again[0]!.editors.map(p => p.name)).toEqual(['Hana Owner'])
  })

  it('a snapshot restore is a checkpoint of the restored document', async () => {
    const networkId = await newNetwork('Snapshot restored')
    const snap = await editor.client.post(`${base}/networks/${networkId}/snapshots`, { title: 'Rev A' })
    expect(snap.status, JSON.stringify(snap.body)).toBe(201)
    const saved = await save(editor.client, networkId, setImpedance(28))
    const restored = await editor.client.post(`${base}/snapshots/${snap.body.id}/restore`, { revision: saved.revision })
    expect(restored.status, JSON.stringify(restored.body)).toBe(200)
    const list = await checkpoints(networkId)
    expect(list[0]).toMatchObject({ reason: 'snapshot-restore', revision: restored.body.revision })
    expect(impedanceOf((await checkpoint(networkId, list[0]!.id)).document)).toBe('Z0/sqrt(2)')
    expect(list[1]!.reason).toBe('save')
  })

  it('restoring a checkpoint is a new change through the revision check: 409 when stale, 403 for a viewer, audited', async () => {
    const networkId = await newNetwork('Checkpoint restored')
    await save(editor.client, networkId, setImpedance(30))
    const latest = await save(editor.client, networkId, setImpedance(45))
    const target = (await checkpoints(networkId)).find(c => c.revision === latest.revision - 1)!
    const path = `${base}/networks/${networkId}/checkpoints/${target.id}/restore`

    const byViewer = await viewer.client.post(path, { revision: latest.revision })
    expect(byViewer.status).toBe(403)
    const stale = await editor.client.post(path, { revision: latest.revision - 1 })
    expect(stale.status).toBe(409)
    expect(stale.body.message).toContain(`revision ${latest.revision}`)
    expect(await network(networkId)).toMatchObject({ revision: latest.revision })
    expect(impedanceOf((await network(networkId)).document)).toBe(45)

    const countBefore = (await checkpoints(networkId)).length
    const done = await editor.client.post(path, { revision: latest.revision })
    expect(done.status, JSON.stringify(done.body)).toBe(200)
    expect(done.body.revision).toBe(latest.revision + 1)
    const now = await network(networkId)
    expect(now.revision).toBe(latest.revision + 1)
    expect(impedanceOf(now.document)).toBe(30)
    const list = await checkpoints(networkId)
    expect(list.length).toBe(countBefore + 1)
    expect(list[0]).toMatchObject({ reason: 'checkpoint-restore', revision: latest.revision + 1 })
    expect(list[0]!.editors.map(p => p.name)).toEqual(['Emil Editor'])

    const audit = await owner.client.get(`${base}/audit`)
    const event = audit.body.find((e: { action: string }) => e.action === 'checkpoint.restored')
    expect(event?.detail).toMatchObject({ checkpointId: target.id, networkId, revision: latest.revision + 1 })
  })

  it('a checkpoint restore reaches an editor who has the network open live', async () => {
    const networkId = await newNetwork('Restored under a live editor')
    await save(editor.client, networkId, setImpedance(29))
    const latest = await save(editor.client, networkId, setImpedance(47))
    const target = (await checkpoints(networkId)).find(c => c.revision === latest.revision - 1)!
    const live = liveClient(appUrl(), networkId, owner.client.cookie)
    liveClients.push(live)
    await synced(live)
    expect(impedanceOf(live.read())).toBe(47)
    const done = await editor.client.post(`${base}/networks/${networkId}/checkpoints/${target.id}/restore`, { revision: latest.revision })
    expect(done.status, JSON.stringify(done.body)).toBe(200)
    await until('the restored value at the live client', () => impedanceOf(live.read()) === 29)
    live.destroy()
  })

  it('live editing: at most one checkpoint per interval while edits arrive, and one when the last editor leaves', async () => {
    const networkId = await newNetwork('Edited live')
    const live = liveClient(appUrl(), networkId, editor.client.cookie)
    liveClients.push(live)
    await synced(live)
    const addLoad = (id: string) => live.edit((d) => { d.blocks.push({ id, type: 'load', params: { resistance: 50 }, layout: { x: 0, y: 0 } }) })
    const merged = (id: string) => until(`merge of ${id}`, async () => (await network(networkId)).document.blocks.some(b => b.id === id))

    addLoad('R_FIRST')
    await merged('R_FIRST')
    // The first merged change of a network without history keeps what it replaced, then the change itself.
    const first = await until('first checkpoints', async () => { const l = await checkpoints(networkId); return l.length === 2 ? l : null })
    expect(first.map(c => c.reason)).toEqual(['editing', 'before-change'])
    expect(first[0]!.editors.map(p => p.name)).toEqual(['Emil Editor'])

    addLoad('R_SECOND')
    await merged('R_SECOND')
    // Inside the interval: no checkpoint, but the editor is remembered for the next one.
    expect((await checkpoints(networkId)).length).toBe(2)
    const pending = await db.query('SELECT editors_since_checkpoint::text[] AS e FROM network_live_states WHERE network_id = $1', [networkId])
    expect(pending.rows[0].e).toEqual([editor.id])

    // Six minutes pass (the checkpoints are made older): the next merge is due and keeps the end of the earlier edits.
    await db.query(`UPDATE network_checkpoints SET created_at = created_at - interval '6 minutes' WHERE network_id = $1`, [networkId])
    addLoad('R_THIRD')
    await merged('R_THIRD')
    const third = await until('interval checkpoint', async () => { const l = await checkpoints(networkId); return l.length === 3 ? l : null })
    expect(third[0]!.reason).toBe('editing')
    const thirdDoc = (await checkpoint(networkId, third[0]!.id)).document
    expect(thirdDoc.blocks.map(b => b.id)).toContain('R_SECOND')
    expect(thirdDoc.blocks.map(b => b.id)).not.toContain('R_THIRD')

    live.destroy()
    const last = await until('checkpoint at session end', async () => { const l = await checkpoints(networkId); return l.length === 4 ? l : null })
    expect(last[0]!.reason).toBe('session-end')
    expect(last[0]!.editors.map(p => p.name)).toEqual(['Emil Editor'])
    expect((await checkpoint(networkId, last[0]!.id)).document.blocks.map(b => b.id)).toContain('R_THIRD')
  })

  it('retention prunes on write: all of the last day, then one per clock hour to 7 days, one per UTC day to 90 days', async () => {
    const networkId = await newNetwork('Long history')
    const current = await network(networkId)
    const hour = 3600_000
    const day = 24 * hour
    const now = Date.now()
    const hourStart = Math.floor((now - 30 * hour) / hour) * hour
    const dayStart = Math.floor((now - 20 * day) / day) * day
    // Invented timestamps: three in one clock hour 30 h ago, two in one UTC day 20 days ago, one 100 days ago, one 2 h ago.
    const invented: Record<string, number> = {
      recent: now - 2 * hour,
      hourLate: hourStart + 50 * 60_000,
      hourMid: hourStart + 30 * 60_000,
      hourEarly: hourStart + 10 * 60_000,
      dayLate: dayStart + 20 * hour,
      dayEarly: dayStart + 2 * hour,
      ancient: now - 100 * day,
    }
    const ids: Record<string, string> = {}
    for (const [name, at] of Object.entries(invented)) {
      const row = await db.query(
        `INSERT INTO network_checkpoints (id, network_id, document, revision, reason, editor_ids, block_count, created_at)
         VALUES (gen_random_uuid(), $1, $2::jsonb, $3, 'save', '{}', 0, $4) RETURNING id`,
        [networkId, JSON.stringify(current.document), current.revision, new Date(at)],
      )
      ids[name] = row.rows[0].id
    }
    await save(editor.client, networkId, setImpedance(33))
    const left = new Set((await checkpoints(networkId)).map(c => c.id))
    const kept = Object.keys(ids).filter(name => left.has(ids[name]!)).sort()
    expect(kept).toEqual(['dayLate', 'hourLate', 'recent'])
    expect(left.size).toBe(4)
  })

  it('a checkpoint that cannot be written never undoes the save it belongs to', async () => {
    const networkId = await newNetwork('History refused')
    // Only this network's checkpoints are refused, so tests running beside this one are untouched.
    await db.query(`ALTER TABLE network_checkpoints ADD CONSTRAINT refuse_one_network CHECK (network_id <> '${networkId}') NOT VALID`)
    try {
      const saved = await save(editor.client, networkId, setImpedance(39))
      expect(impedanceOf((await network(networkId)).document)).toBe(39)
      expect((await network(networkId)).revision).toBe(saved.revision)
      expect(await checkpoints(networkId)).toEqual([])
    } finally {
      await db.query('ALTER TABLE network_checkpoints DROP CONSTRAINT refuse_one_network')
    }
  })

  it('a checkpoint of another network, or a malformed id, answers 404', async () => {
    const a = await newNetwork('History A')
    const b = await newNetwork('History B')
    await save(editor.client, a, setImpedance(31))
    const ofA = (await checkpoints(a))[0]!.id
    expect((await viewer.client.get(`${base}/networks/${b}/checkpoints/${ofA}`)).status).toBe(404)
    expect((await viewer.client.get(`${base}/networks/${b}/checkpoints/not-a-uuid`)).status).toBe(404)
  })
})
