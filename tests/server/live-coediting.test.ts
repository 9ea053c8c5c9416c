/**
 * Live co-editing against the built app and real PostgreSQL, with y-websocket's
 * own client over `ws`: convergence, durability across kill -9, read-only
 * roles, refused upgrades, removed and demoted members, and two app instances
 * on one database.
 */
import { resolve } from 'node:path'
import type { ChildProcess } from 'node:child_process'
import pg from 'pg'
import WebSocket from 'ws'
import * as encoding from 'lib0/encoding'
import * as decoding from 'lib0/decoding'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { NetworkDocument } from '../../shared/network/types'
import { startServer, stopProcess } from '../../scripts/lib/server-process'
import { appUrl } from '../support/app'
import { newSignedInUser, type ApiClient } from '../support/http'
import { liveClient, liveServerUrl, presenceMessage, synced, until, upgradeStatus, type LiveClient } from '../support/live'

const root = resolve(import.meta.dirname, '..', '..')
const basePort = Number(process.env.PORTWRIGHT_TEST_PORT ?? 3939)
/** Extra app instances next to the test run's own port, so parallel runs with their own ports do not collide. */
const extraPorts = [basePort + 12, basePort + 13]
const serverEnv = () => ({
  NUXT_DATABASE_URL: process.env.NUXT_DATABASE_URL!,
  NUXT_SESSION_PASSWORD: process.env.NUXT_SESSION_PASSWORD!,
  PORTWRIGHT_TRUST_PROXY: '1',
})

let db: pg.Client
const clients: LiveClient[] = []
const children: ChildProcess[] = []

interface Team { owner: ApiClient, editor: ApiClient, editorId: string, reviewer: ApiClient, viewer: ApiClient, projectId: string }
let team: Team

async function makeTeam(): Promise<Team> {
  const owner = await newSignedInUser('Live Owner')
  const editor = await newSignedInUser('Live Editor')
  const reviewer = await newSignedInUser('Live Reviewer')
  const viewer = await newSignedInUser('Live Viewer')
  const project = await owner.client.post('/api/projects', { name: 'Live co-editing' })
  expect(project.status).toBe(201)
  for (const [who, role] of [[editor, 'editor'], [reviewer, 'reviewer'], [viewer, 'viewer']] as const) {
    const added = await owner.client.post(`/api/projects/${project.body.id}/members`, { email: who.email, role })
    expect(added.status, JSON.stringify(added.body)).toBeLessThan(300)
  }
  return { owner: owner.client, editor: editor.client, editorId: editor.id, reviewer: reviewer.client, viewer: viewer.client, projectId: project.body.id }
}

async function newNetwork(name: string): Promise<string> {
  const made = await team.owner.post(`/api/projects/${team.projectId}/networks`, { name })
  expect(made.status, JSON.stringify(made.body)).toBe(201)
  return made.body.id
}

function connect(client: ApiClient, networkId: string, base = appUrl()): LiveClient {
  const live = liveClient(base, networkId, client.cookie)
  clients.push(live)
  return live
}

function addLoad(id: string, resistance: number) {
  return (d: NetworkDocument) => { d.blocks.push({ id, type: 'load', params: { resistance }, layout: { x: 0, y: 0 } }) }
}

/** JSON with object keys sorted, for comparing documents that went through JSONB. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_k, v) => (v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => a.localeCompare(b))) : v))
}

function ids(doc: NetworkDocument): string[] {
  return doc.blocks.map(b => b.id).sort()
}

async function storedDocument(networkId: string): Promise<{ document: NetworkDocument, revision: number }> {
  const answer = await team.owner.get(`/api/projects/${team.projectId}/networks/${networkId}`)
  expect(answer.status).toBe(200)
  return { document: answer.body.document, revision: answer.body.revision }
}

async function closeAll(list: LiveClient[]) {
  for (const c of list) c.destroy()
}

beforeAll(async () => {
  db = new pg.Client({ connectionString: process.env.PORTWRIGHT_TEST_DATABASE_URL })
  await db.connect()
  team = await makeTeam()
})

afterAll(async () => {
  for (const c of clients) c.destroy()
  for (const child of children) await stopProcess(child)
  await db?.end()
})

describe('live co-editing', () => {
  it('three clients with interleaved concurrent edits converge, and the stored document equals theirs', async () => {
    const networkId = await newNetwork('Converge')
    const a = connect(team.owner, networkId)
    const b = connect(team.editor, networkId)
    const c = connect(team.owner, networkId)
    await Promise.all([synced(a), synced(b), synced(c)])
    // Shared block that all three edit at once, each a different parameter.
    a.edit(d => { d.blocks.push({ id: 'TL', type: 'line', params: { impedance: 50, degrees: 90, at: '1 GHz' } }) })
    await until('shared block everywhere', () => [b, c].every(x => x.read().blocks.some(blk => blk.id === 'TL')))
    const writers = [a, b, c]
    for (let round = 0; round < 12; round++) {
      // All three edit before any of them hears the others: truly concurrent transactions.
      writers.forEach((w, i) => w.edit(addLoad(`R${i}_${round}`, 10 * (round + 1) + i)))
      a.edit(d => { d.blocks.find(x => x.id === 'TL')!.params.impedance = 50 + round })
      b.edit(d => { d.blocks.find(x => x.id === 'TL')!.params.degrees = 90 + round })
      c.edit(d => { d.variables = { ...d.variables, [`v${round}`]: `${round} mm` } })
      await new Promise(r => setTimeout(r, round % 3 === 0 ? 0 : 15))
    }
    const expected = 1 + 3 * 12
    await until('convergence', () => {
      const docs = writers.map(w => JSON.stringify(w.read()))
      return docs[0] === docs[1] && docs[1] === docs[2] && writers[0]!.read().blocks.length === expected
    })
    const final = a.read()
    expect(final.blocks.find(x => x.id === 'TL')!.params).toMatchObject({ impedance: 61, degrees: 101 })
    expect(Object.keys(final.variables ?? {}).filter(k => /^v\d+$/.test(k))).toHaveLength(12)
    await closeAll(writers)
    // The last one out merges: the JSON document and its revision follow the Yjs state.
    const stored = await until('merged document', async () => {
      const s = await storedDocument(networkId)
      // JSONB keeps its own key order: compare content, not text.
      return canonical(s.document) === canonical(final) ? s : null
    })
    expect(stored.revision).toBeGreaterThan(1)
    const log = await db.query('SELECT count(*)::int AS n FROM network_updates WHERE network_id = $1', [networkId])
    expect(log.rows[0].n).toBe(0)
  })

  it('viewer and reviewer writes reach neither other clients nor the database, yet they receive updates', async () => {
    const networkId = await newNetwork('Read only')
    const writer = connect(team.editor, networkId)
    const viewer = connect(team.viewer, networkId)
    const reviewer = connect(team.reviewer, networkId)
    await Promise.all([synced(writer), synced(viewer), synced(reviewer)])
    viewer.edit(addLoad('FROM_VIEWER', 1))
    reviewer.edit(addLoad('FROM_REVIEWER', 2))
    reviewer.edit(d => { d.name = 'renamed by reviewer' })
    // A writer's edit after theirs works as a barrier: once readers see it, their own messages were handled before.
    writer.edit(addLoad('FROM_EDITOR', 3))
    await until('readers receive the editor\'s block', () => [viewer, reviewer].every(r => r.read().blocks.some(b => b.id === 'FROM_EDITOR')))
    await new Promise(r => setTimeout(r, 300))
    expect(ids(writer.read())).toEqual(['FROM_EDITOR'])
    expect(writer.read().name).toBe('Read only')
    const stored = await db.query(
      `SELECT count(*)::int AS n FROM network_updates u JOIN users x ON x.id = u.user_id
        WHERE u.network_id = $1 AND x.name IN ('Live Viewer', 'Live Reviewer')`, [networkId])
    expect(stored.rows[0].n).toBe(0)
    // A late joiner gets only what was accepted.
    const late = connect(team.owner, networkId)
    await synced(late)
    expect(ids(late.read())).toEqual(['FROM_EDITOR'])
    await closeAll([writer, viewer, reviewer, late])
    const merged = await until('merge', async () => {
      const s = await storedDocument(networkId)
      return s.document.blocks.length ? s.document : null
    })
    expect(ids(merged)).toEqual(['FROM_EDITOR'])
    expect(merged.name).toBe('Read only')
  })

  it('takes a document saved through the API into the live document instead of losing it at the next merge', async () => {
    const networkId = await newNetwork('Saved through the API')
    const live = connect(team.editor, networkId)
    await synced(live)
    live.edit(addLoad('LIVE_FIRST', 1))
    const current = await until('live edit merged into the JSON document', async () => {
      const s = await storedDocument(networkId)
      return s.document.blocks.some(b => b.id === 'LIVE_FIRST') ? s : null
    })
    const saved = structuredClone(current.document)
    saved.blocks.push({ id: 'FROM_API', type: 'load', params: { resistance: 75 } })
    const put = await team.owner.put(`/api/projects/${team.projectId}/networks/${networkId}`, { document: saved, revision: current.revision })
    expect(put.status, JSON.stringify(put.body)).toBe(200)
    await until('API save at the live client', () => live.read().blocks.some(b => b.id === 'FROM_API'))
    expect(ids(live.read())).toEqual(['FROM_API', 'LIVE_FIRST'])
    live.edit(addLoad('LIVE_AFTER', 2))
    live.destroy()
    const merged = await until('merge keeps both', async () => {
      const s = await storedDocument(networkId)
      return s.document.blocks.length === 3 ? s : null
    })
    expect(ids(merged.document)).toEqual(['FROM_API', 'LIVE_AFTER', 'LIVE_FIRST'])
    expect(merged.revision).toBeGreaterThan(put.body.revision)
  })

  it('refuses a signed-out upgrade, a foreign Origin and a non-member', async () => {
    const networkId = await newNetwork('Gate')
    const url = `${liveServerUrl(appUrl())}/${networkId}`
    expect(await upgradeStatus(url, { origin: appUrl() })).toBe(401)
    expect(await upgradeStatus(url, { origin: 'https://evil.example', cookie: team.owner.cookie })).toBe(403)
    expect(await upgradeStatus(url, { cookie: team.owner.cookie })).toBe(403)
    const outsider = await newSignedInUser('Live Outsider')
    expect(await upgradeStatus(url, { origin: appUrl(), cookie: outsider.client.cookie })).toBe(404)
    expect(await upgradeStatus(`${liveServerUrl(appUrl())}/${crypto.randomUUID()}`, { origin: appUrl(), cookie: team.owner.cookie })).toBe(404)
    // The same owner with the right Origin is let in: the refusals above are about the request, not the route.
    expect(await upgradeStatus(url, { origin: appUrl(), cookie: team.owner.cookie })).toBe(101)
  })

  it('refuses and logs undecodable and oversized updates without storing them', async () => {
    const networkId = await newNetwork('Bad updates')
    const url = `${liveServerUrl(appUrl())}/${networkId}`
    const send = (payload: Uint8Array) => new Promise<number>((resolveClose, reject) => {
      const ws = new WebSocket(url, { headers: { origin: appUrl(), cookie: team.owner.cookie } })
      ws.on('open', () => {
        const encoder = encoding.createEncoder()
        encoding.writeVarUint(encoder, 0) // sync
        encoding.writeVarUint(encoder, 2) // update
        encoding.writeVarUint8Array(encoder, payload)
        ws.send(encoding.toUint8Array(encoder))
      })
      ws.on('close', code => resolveClose(code))
      ws.on('error', reject)
    })
    expect(await send(new Uint8Array([200, 201, 202, 203, 204, 255, 255, 255, 255, 15]))).toBe(4400)
    expect(await send(new Uint8Array(1024 * 1024 + 10).fill(7))).toBe(4413)
    const rows = await db.query('SELECT count(*)::int AS n FROM network_updates WHERE network_id = $1', [networkId])
    expect(rows.rows[0].n).toBe(0)
  })

  it('closes a removed member\'s connection at once and makes a demoted editor read-only', async () => {
    const member = await newSignedInUser('Live Temporary')
    const demoted = await newSignedInUser('Live Demoted')
    for (const who of [member, demoted]) await team.owner.post(`/api/projects/${team.projectId}/members`, { email: who.email, role: 'editor' })
    const networkId = await newNetwork('Membership')
    const removedClient = connect(member.client, networkId)
    const demotedClient = connect(demoted.client, networkId)
    const owner = connect(team.owner, networkId)
    await Promise.all([synced(removedClient), synced(demotedClient), synced(owner)])
    const removedAt = Date.now()
    expect((await team.owner.delete(`/api/projects/${team.projectId}/members/${member.id}`)).status).toBe(200)
    await until('removed member disconnected', () => removedClient.closes.some(c => c.code === 4403), 3000)
    // Well inside the periodic re-check (5 s): the route's notification did it.
    expect(Date.now() - removedAt).toBeLessThan(3000)
    expect(removedClient.provider.shouldConnect).toBe(false)
    expect((await team.owner.patch(`/api/projects/${team.projectId}/members/${demoted.id}`, { role: 'viewer' })).status).toBe(200)
    await until('demoted editor told to reconnect', () => demotedClient.closes.some(c => c.code === 4509), 3000)
    await synced(demotedClient)
    demotedClient.edit(addLoad('AFTER_DEMOTION', 1))
    owner.edit(addLoad('OWNER_BARRIER', 2))
    await until('barrier at the demoted client', () => demotedClient.read().blocks.some(b => b.id === 'OWNER_BARRIER'))
    await new Promise(r => setTimeout(r, 300))
    expect(ids(owner.read())).toEqual(['OWNER_BARRIER'])
  })

  it('two app instances on one database see each other\'s edits and presence', async () => {
    const other = await startServer(root, serverEnv(), extraPorts[0]!)
    children.push(other)
    const otherUrl = `http://127.0.0.1:${extraPorts[0]}`
    const networkId = await newNetwork('Two instances')
    const here = connect(team.owner, networkId)
    const there = connect(team.editor, networkId, otherUrl)
    await Promise.all([synced(here), synced(there)])
    here.edit(addLoad('HERE', 1))
    await until('edit from instance 1 at instance 2', () => there.read().blocks.some(b => b.id === 'HERE'))
    there.edit(addLoad('THERE', 2))
    await until('edit from instance 2 at instance 1', () => here.read().blocks.some(b => b.id === 'THERE'))
    there.provider.awareness.setLocalStateField('selection', ['HERE'])
    const seen = await until('presence across instances', () => [...here.provider.awareness.getStates().values()]
      .find(s => (s as { user?: { name?: string } }).user?.name === 'Live Editor') as { selection?: string[] } | undefined)
    expect(seen.selection).toEqual(['HERE'])
    await closeAll([here, there])
    await stopProcess(other)
  })

  it('sends presence in batches stamped with each sender\'s name, and nobody speaks for a client id another connection holds', async () => {
    const networkId = await newNetwork('Presence batches')
    const address = `${liveServerUrl(appUrl())}/${networkId}`
    const open = (cookie: string) => new Promise<WebSocket>((done, fail) => {
      const socket = new WebSocket(address, { headers: { cookie, origin: appUrl() } })
      socket.once('open', () => done(socket))
      socket.once('error', fail)
    })
    /** Awareness messages as [client id, clock, state] entries, one array per message. */
    const received: Array<Array<[number, number, Record<string, unknown> | null]>> = []
    const observer = await open(team.owner.cookie)
    observer.on('message', (data: Buffer) => {
      const decoder = decoding.createDecoder(new Uint8Array(data))
      if (decoding.readVarUint(decoder) !== 1) return
      const update = decoding.createDecoder(decoding.readVarUint8Array(decoder))
      const entries: Array<[number, number, Record<string, unknown> | null]> = []
      for (let n = decoding.readVarUint(update); n > 0; n--) {
        entries.push([decoding.readVarUint(update), decoding.readVarUint(update), JSON.parse(decoding.readVarString(update))])
      }
      received.push(entries)
    })
    const senders = await Promise.all(Array.from({ length: 30 }, () => open(team.editor.cookie)))
    // Everyone renews at once, as clients that joined together do; each claims to be someone else.
    senders.forEach((socket, k) => socket.send(presenceMessage(5000 + k, 1, { selection: [`B${k}`], user: { name: 'Somebody Else', role: 'owner' } })))
    const latest = () => new Map(received.flat().map(([id, clock, state]) => [id, { clock, state }]))
    await until('30 presences at the observer', () => [...latest().keys()].filter(id => id >= 5000 && id < 5030).length === 30)
    // Sent one message per change before; a batch carries many (the window is 50 ms: a few batches, more only on a slow machine).
    expect(received.length).toBeLessThanOrEqual(10)
    for (const [id, { state }] of latest()) {
      if (id < 5000 || id >= 5030) continue
      expect(state?.selection).toEqual([`B${id - 5000}`])
      expect(state?.user).toMatchObject({ name: 'Live Editor', role: 'editor' })
    }
    // Client 5000 belongs to the first connection: a second connection's state for it never arrives.
    senders[1]!.send(presenceMessage(5000, 2, { selection: ['TAKEN'] }))
    senders[0]!.send(presenceMessage(5000, 3, { selection: ['MINE'] }))
    await until('the owner\'s renewal', () => latest().get(5000)?.clock === 3)
    expect(received.flat().some(([, , state]) => JSON.stringify(state).includes('TAKEN'))).toBe(false)
    // Leaving removes the states, in batches too.
    const before = received.length
    for (const socket of senders) socket.close()
    await until('presences removed', () => [...latest()].filter(([id, { state }]) => id >= 5000 && id < 5030 && state === null).length === 30)
    expect(received.length - before).toBeLessThanOrEqual(10)
    observer.close()
  })

  it('keeps every edit through a kill -9 of the server in the middle of a burst', async () => {
    const port = extraPorts[1]!
    const base = `http://127.0.0.1:${port}`
    let server = await startServer(root, serverEnv(), port)
    children.push(server)
    const networkId = await newNetwork('Crash')
    const writers = [connect(team.owner, networkId, base), connect(team.editor, networkId, base), connect(team.owner, networkId, base)]
    await Promise.all(writers.map(w => synced(w)))
    const perWriter = 40
    let killed = false
    for (let k = 0; k < perWriter; k++) {
      writers.forEach((w, i) => w.edit(addLoad(`K${i}_${k}`, k + 1)))
      if (k === 15) {
        server.kill('SIGKILL')
        killed = true
      }
      // Edits keep coming while the server is down: they stay in the clients until it is back.
      if (k === 25 && killed) {
        server = await startServer(root, serverEnv(), port)
        children.push(server)
      }
      await new Promise(r => setTimeout(r, 5))
    }
    const expected = writers.length * perWriter
    await until('every edit after restart', () => writers.every(w => w.provider.synced && w.read().blocks.length === expected), 20_000)
    const final = writers[0]!.read()
    expect(writers.map(w => JSON.stringify(w.read()))).toEqual(writers.map(() => JSON.stringify(final)))
    await closeAll(writers)
    const stored = await until('every edit in the database', async () => {
      const s = await storedDocument(networkId)
      return s.document.blocks.length === expected ? s.document : null
    }, 15_000)
    expect(ids(stored)).toEqual(ids(final))
    await stopProcess(server)
  })
})
