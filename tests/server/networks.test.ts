import { beforeAll, describe, expect, it } from 'vitest'
import { newSignedInUser } from '../support/http'
import { TEMPLATES } from '../../shared/templates/index'

const doc = (name: string, extra: Record<string, unknown> = {}) => ({
  format: 'portwright.network',
  version: 1,
  name,
  referenceImpedance: 50,
  variables: { f0: '2.45 GHz' },
  sweep: { start: '2 GHz', stop: '3 GHz', points: 11, spacing: 'linear' },
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 } },
    { id: 'P2', type: 'port', params: { index: 2 } },
    { id: 'L1', type: 'line', params: { impedance: 50, degrees: 90, at: 'f0' } },
  ],
  wires: [['P1.1', 'L1.1'], ['L1.2', 'P2.1']],
  ...extra,
})

describe('networks', () => {
  let owner: Awaited<ReturnType<typeof newSignedInUser>>
  let editor: Awaited<ReturnType<typeof newSignedInUser>>
  let base: string

  beforeAll(async () => {
    owner = await newSignedInUser('Network Owner')
    editor = await newSignedInUser('Network Editor')
    const projectId = (await owner.client.post('/api/projects', { name: 'Networks' })).body.id
    await owner.client.post(`/api/projects/${projectId}/members`, { email: editor.email, role: 'editor' })
    base = `/api/projects/${projectId}/networks`
  })

  it('creates an empty network that is a valid contract document', async () => {
    const made = await owner.client.post(base, { name: 'Empty start' })
    expect(made.status).toBe(201)
    expect(made.body).toMatchObject({ name: 'Empty start', revision: 1, role: 'owner' })
    expect(made.body.document).toMatchObject({ format: 'portwright.network', version: 1, name: 'Empty start', blocks: [], wires: [] })
  })

  it('stores a given document, keeping extra keys the contract allows', async () => {
    const made = await owner.client.post(base, { name: 'Through line', document: doc('ignored', { note: 'kept' }) })
    const read = await editor.client.get(`${base}/${made.body.id}`)
    expect(read.body.document).toMatchObject({ name: 'Through line', note: 'kept', wires: [['P1.1', 'L1.1'], ['L1.2', 'P2.1']] })
  })

  it('refuses a document that breaks the contract with 422 and the problems listed', async () => {
    const answer = await owner.client.post(base, { name: 'Bad', document: { format: 'something-else', version: 1, blocks: [], wires: [] } })
    expect(answer.status).toBe(422)
    expect(answer.body.data.problems.length).toBeGreaterThan(0)
    expect(answer.body.message).toMatch(/format/)
  })

  it('updates with the current revision and refuses a stale one with 409, storing nothing', async () => {
    const made = await owner.client.post(base, { name: 'Contended', document: doc('Contended') })
    const url = `${base}/${made.body.id}`
    const first = await editor.client.put(url, { revision: 1, document: doc('Contended', { variables: { f0: '2.4 GHz' } }) })
    expect(first.status).toBe(200)
    expect(first.body.revision).toBe(2)
    const stale = await owner.client.put(url, { revision: 1, document: doc('Contended', { variables: { f0: '9 GHz' } }) })
    expect(stale.status).toBe(409)
    expect(stale.body.data.revision).toBe(2)
    const now = await owner.client.get(url)
    expect(now.body.document.variables.f0).toBe('2.4 GHz')
    expect(now.body.updatedBy).toBe(editor.id)
  })

  it('renames trimmed, never to an empty name, and refuses names over 200 characters', async () => {
    const made = await owner.client.post(base, { name: '  Renamed feed  ', document: doc('ignored') })
    expect(made.body.name).toBe('Renamed feed')
    const url = `${base}/${made.body.id}`
    const spaced = await owner.client.put(url, { revision: 1, document: doc('  Corporate feed  ') })
    expect(spaced.status).toBe(200)
    expect(spaced.body.name).toBe('Corporate feed')
    const blank = await owner.client.put(url, { revision: 2, document: doc('   ') })
    expect(blank.status).toBe(200)
    expect(blank.body.name).toBe('Corporate feed')
    const long = await owner.client.put(url, { revision: 3, document: doc('x'.repeat(201)) })
    expect(long.status).toBe(422)
    expect(long.body.message).toMatch(/200 characters/)
    expect((await owner.client.post(base, { name: '   ' })).status).toBe(400)
  })

  it('keeps the saved document when an update is invalid', async () => {
    const made = await owner.client.post(base, { name: 'Kept', document: doc('Kept') })
    const url = `${base}/${made.body.id}`
    const bad = await owner.client.put(url, { revision: 1, document: { ...doc('Kept'), blocks: 'not a list' } })
    expect(bad.status).toBe(422)
    const now = await owner.client.get(url)
    expect(now.body.revision).toBe(1)
    expect(now.body.document.blocks).toHaveLength(3)
  })

  it('names a missing revision in the error', async () => {
    const made = await owner.client.post(base, { name: 'No revision' })
    const answer = await owner.client.put(`${base}/${made.body.id}`, { document: doc('x') })
    expect(answer.status).toBe(400)
    expect(answer.body.data.fields.revision).toBeTruthy()
  })

  it('creates a network from every template, keeping its spec, tunables and tolerances; a viewer may not', async () => {
    const viewer = await newSignedInUser('Network Viewer')
    const projectId = base.split('/')[3]
    await owner.client.post(`/api/projects/${projectId}/members`, { email: viewer.email, role: 'viewer' })
    for (const template of TEMPLATES) {
      const document = template.build()
      const made = await editor.client.post(base, { name: document.name, document })
      expect(made.status, template.slug).toBe(201)
      expect(made.body.document).toEqual(document)
    }
    const refused = await viewer.client.post(base, { name: 'Not mine', document: TEMPLATES[0]!.build() })
    expect(refused.status).toBe(403)
  })

  it('deletes a network', async () => {
    const made = await editor.client.post(base, { name: 'Short-lived' })
    expect((await editor.client.delete(`${base}/${made.body.id}`)).status).toBe(200)
    expect((await owner.client.get(`${base}/${made.body.id}`)).status).toBe(404)
  })
})
