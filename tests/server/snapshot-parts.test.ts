// Snapshots freeze what they use: the inner networks of their sub-network blocks and the data files read inside.
import pg from 'pg'
import { beforeAll, describe, expect, it } from 'vitest'
import { fileForm, newSignedInUser } from '../support/http'
import type { NetworkDocument } from '../../shared/network/types'
import type { FrozenPartsDto } from '../../shared/types/review'
import type { StoredFileDataDto } from '../../shared/types/api'
import type { DataSet } from '../../shared/solver/types'
import { solveDocument } from '../../shared/solver'
import { sParameter } from '../../shared/rf/s-parameter'
import { snapshotSummary } from '../../shared/review/snapshot-summary'

// Invented two-ports of our own: a matched pad, |S21| = 0.5 (version 1) and 0.25 (version 2), 1–3 GHz, MA.
const pad = (gain: number) => `! Quillmere pad\n# GHZ S MA R 50\n1 0 0 ${gain} 0 ${gain} 0 0 0\n2 0 0 ${gain} -10 ${gain} -10 0 0\n3 0 0 ${gain} -20 ${gain} -20 0 0\n`

const sweep = { start: '1 GHz', stop: '3 GHz', points: 3, spacing: 'linear' }
/** The inner network: the measured pad then an attenuator, between two ports. */
const inner = (attenuatorDb: number): NetworkDocument => ({
  format: 'portwright.network', version: 1.1, name: 'Inner pad', referenceImpedance: 50, variables: { f0: '2 GHz' }, sweep,
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } },
    { id: 'DA1', type: 'data', params: { file: 'pad.s2p' } }, { id: 'AT1', type: 'attenuator', params: { db: attenuatorDb } },
  ],
  wires: [['P1.1', 'DA1.1'], ['DA1.2', 'AT1.1'], ['AT1.2', 'P2.1']],
} as unknown as NetworkDocument)
/** The outer network: the inner one as a sub-network, named by its name as the contract writes it. */
const outer: NetworkDocument = {
  format: 'portwright.network', version: 1.1, name: 'Outer chain', referenceImpedance: 50, variables: { f0: '2 GHz' }, sweep,
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } },
    { id: 'SN1', type: 'subnetwork', params: { network: 'Inner pad' } },
  ],
  wires: [['P1.1', 'SN1.1'], ['SN1.2', 'P2.1']],
} as unknown as NetworkDocument

// Matched two-ports in cascade: |S21| multiplies, so dB add (derived by hand: no reflections anywhere).
// A pad of |S21| = g is 20·log10(g) dB; an attenuator of A dB is −A dB (common practice).
const chainDb = (gain: number, attenuatorDb: number) => 20 * Math.log10(gain) - attenuatorDb

const asDataSet = (d: StoredFileDataDto): DataSet => ({ ports: d.ports, impedances: d.impedances, frequencies: Float64Array.from(d.frequencies), re: Float64Array.from(d.re), im: Float64Array.from(d.im) })

describe('snapshots freeze their inner networks and data files', () => {
  let owner: Awaited<ReturnType<typeof newSignedInUser>>
  let viewer: Awaited<ReturnType<typeof newSignedInUser>>
  let projectId = ''
  let base = ''
  let innerId = ''
  let outerId = ''
  let fileId = ''

  beforeAll(async () => {
    owner = await newSignedInUser('Frozen Owner')
    viewer = await newSignedInUser('Frozen Viewer')
    projectId = (await owner.client.post('/api/projects', { name: 'Frozen parts' })).body.id
    await owner.client.post(`/api/projects/${projectId}/members`, { email: viewer.email, role: 'viewer' })
    base = `/api/projects/${projectId}`
    const file = await owner.client.request('POST', `${base}/files`, fileForm('pad.s2p', pad(0.5)))
    expect(file.status, JSON.stringify(file.body)).toBe(201)
    fileId = file.body.id
    const made = await owner.client.post(`${base}/networks`, { name: 'Inner pad', document: inner(3) })
    expect(made.status, JSON.stringify(made.body)).toBe(201)
    innerId = made.body.id
    const madeOuter = await owner.client.post(`${base}/networks`, { name: 'Outer chain', document: outer })
    expect(madeOuter.status, JSON.stringify(madeOuter.body)).toBe(201)
    outerId = madeOuter.body.id
  })

  /** Solves a snapshot the way its pages do: its document with its frozen networks and its own copies of the files. */
  async function solveFrozen(snapshotId: string) {
    const shown = await viewer.client.get(`${base}/snapshots/${snapshotId}`)
    expect(shown.status).toBe(200)
    const frozen = shown.body.frozen as FrozenPartsDto
    const networks = new Map(frozen.networks)
    const sets = new Map<string, DataSet>()
    for (const f of frozen.files) {
      const data = await viewer.client.get(`${base}/snapshots/${snapshotId}/data?file=${encodeURIComponent(f.name)}`)
      expect(data.status, JSON.stringify(data.body)).toBe(200)
      sets.set(f.name, asDataSet(data.body))
    }
    const options = { resolveSubnetwork: (ref: string) => networks.get(ref), resolveData: (name: string) => sets.get(name) }
    const solved = solveDocument(shown.body.document, options)
    if (!solved.ok) throw new Error(JSON.stringify(solved.problems))
    return { shown: shown.body, frozen, solved: solved.result, summary: snapshotSummary(shown.body.document, options) }
  }

  const s21Db = (result: Parameters<typeof sParameter>[0], k: number) => {
    const s = sParameter(result, 2, 1)
    return 20 * Math.log10(Math.hypot(s.re[k]!, s.im[k]!))
  }

  it('keeps the inner network and the file version it was frozen with after both change; the live network follows the changes', async () => {
    const snapshot = await owner.client.post(`${base}/networks/${outerId}/snapshots`, { title: 'Before the edits' })
    expect(snapshot.status, JSON.stringify(snapshot.body)).toBe(201)
    expect(snapshot.body.summary.solved, JSON.stringify(snapshot.body.summary)).toBe(true)
    expect(snapshot.body.summary.transfer[0].db).toBeCloseTo(chainDb(0.5, 3), 9)
    expect(snapshot.body.frozen.networks.map(([ref]: [string]) => ref)).toEqual(['Inner pad'])
    expect(snapshot.body.frozen.files).toMatchObject([{ name: 'pad.s2p', fileId, version: 1 }])

    // Edit the inner network (attenuator 3 → 10 dB) and replace the file (|S21| 0.5 → 0.25).
    const current = await owner.client.get(`${base}/networks/${innerId}`)
    const saved = await owner.client.put(`${base}/networks/${innerId}`, { revision: current.body.revision, document: inner(10) })
    expect(saved.status, JSON.stringify(saved.body)).toBe(200)
    const replaced = await owner.client.request('PUT', `${base}/files/${fileId}`, fileForm('pad.s2p', pad(0.25)))
    expect(replaced.status, JSON.stringify(replaced.body)).toBe(200)
    expect(replaced.body.version).toBe(2)

    // The old snapshot, solved from what it froze, is unchanged at every frequency, and so is its stored summary.
    const old = await solveFrozen(snapshot.body.id)
    for (let k = 0; k < 3; k++) expect(s21Db(old.solved, k)).toBeCloseTo(chainDb(0.5, 3), 9)
    expect(old.shown.summary).toEqual(snapshot.body.summary)
    expect(old.summary.transfer![0]!.db).toBeCloseTo(chainDb(0.5, 3), 9)
    expect(old.frozen.files).toMatchObject([{ name: 'pad.s2p', version: 1 }])

    // The live network uses the new inner network and file: a new snapshot says so.
    const now = await owner.client.post(`${base}/networks/${outerId}/snapshots`, { title: 'After the edits' })
    expect(now.status).toBe(201)
    expect(now.body.summary.transfer[0].db).toBeCloseTo(chainDb(0.25, 10), 9)
    const fresh = await solveFrozen(now.body.id)
    for (let k = 0; k < 3; k++) expect(s21Db(fresh.solved, k)).toBeCloseTo(chainDb(0.25, 10), 9)
    expect(fresh.frozen.files).toMatchObject([{ name: 'pad.s2p', version: 2 }])

    // Compare gives each side the parts it is solved with: the old snapshot's frozen ones, the live ones now.
    const compared = await viewer.client.get(`${base}/snapshots/${snapshot.body.id}/compare?with=live`)
    expect(compared.status).toBe(200)
    const attenuation = (parts: FrozenPartsDto) => (parts.networks[0]![1].blocks.find(b => b.id === 'AT1')!.params as { db: number }).db
    expect(attenuation(compared.body.before.parts)).toBe(3)
    expect(attenuation(compared.body.after.parts)).toBe(10)
    expect(compared.body.before.parts.files[0].version).toBe(1)
    expect(compared.body.after.parts.files[0].version).toBe(2)
  })

  it('a snapshot made before snapshots froze their parts still reads the live ones', async () => {
    const snapshot = await owner.client.post(`${base}/networks/${outerId}/snapshots`, { title: 'Made the old way' })
    expect(snapshot.status).toBe(201)
    // As a snapshot stored before migration 0011 looks: no frozen networks, no file copies.
    const db = new pg.Client({ connectionString: process.env.PORTWRIGHT_TEST_DATABASE_URL })
    await db.connect()
    try {
      await db.query('UPDATE snapshots SET networks = NULL WHERE id = $1', [snapshot.body.id])
      await db.query('DELETE FROM snapshot_files WHERE snapshot_id = $1', [snapshot.body.id])
    } finally {
      await db.end()
    }
    const shown = await viewer.client.get(`${base}/snapshots/${snapshot.body.id}`)
    expect(shown.status).toBe(200)
    expect(shown.body.frozen).toBeNull()
    expect((await viewer.client.get(`${base}/snapshots/${snapshot.body.id}/data?file=pad.s2p`)).status).toBe(404)
    const compared = await viewer.client.get(`${base}/snapshots/${snapshot.body.id}/compare?with=live`)
    expect(compared.status).toBe(200)
    expect(compared.body.before.parts).toBeNull()
    expect(compared.body.after.parts.networks.map(([ref]: [string]) => ref)).toEqual(['Inner pad'])
  })

  it('lets a file that only snapshots use be deleted; the snapshots keep their copy', async () => {
    const snapshot = await owner.client.post(`${base}/networks/${outerId}/snapshots`, { title: 'Before the file goes' })
    expect(snapshot.status).toBe(201)
    // A network still uses it: refused, as before.
    expect((await owner.client.delete(`${base}/files/${fileId}`)).status).toBe(409)
    const current = await owner.client.get(`${base}/networks/${innerId}`)
    const withoutData = inner(10)
    withoutData.blocks = withoutData.blocks.filter(b => b.id !== 'DA1')
    withoutData.wires = [['P1.1', 'AT1.1'], ['AT1.2', 'P2.1']]
    expect((await owner.client.put(`${base}/networks/${innerId}`, { revision: current.body.revision, document: withoutData })).status).toBe(200)
    const deleted = await owner.client.delete(`${base}/files/${fileId}`)
    expect(deleted.status, JSON.stringify(deleted.body)).toBe(200)

    const kept = await solveFrozen(snapshot.body.id)
    for (let k = 0; k < 3; k++) expect(s21Db(kept.solved, k)).toBeCloseTo(chainDb(0.25, 10), 9)
    // The copy no longer points at a project file.
    expect(kept.frozen.files).toMatchObject([{ name: 'pad.s2p', fileId: null, version: 2 }])
    const missing = await viewer.client.get(`${base}/snapshots/${snapshot.body.id}/data?file=other.s2p`)
    expect(missing.status).toBe(404)
    expect(missing.body.message).toBe('This snapshot keeps no data file named other.s2p.')
  })
})
