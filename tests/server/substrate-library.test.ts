// A project's substrate library: boards listed by every member, changed by editors, checked at the door.
import { beforeAll, describe, expect, it } from 'vitest'
import { newSignedInUser } from '../support/http'

describe('substrate library', () => {
  let owner: Awaited<ReturnType<typeof newSignedInUser>>
  let viewer: Awaited<ReturnType<typeof newSignedInUser>>
  let base = ''

  beforeAll(async () => {
    owner = await newSignedInUser('Library Owner')
    viewer = await newSignedInUser('Library Viewer')
    const projectId = (await owner.client.post('/api/projects', { name: 'Library' })).body.id
    await owner.client.post(`/api/projects/${projectId}/members`, { email: viewer.email, role: 'viewer' })
    base = `/api/projects/${projectId}/substrates`
  })

  it('adds a board with defaults, lists it by name for a viewer, changes and deletes it', async () => {
    const made = await owner.client.post(base, { name: 'Invented board B', permittivity: 3.5, height: 5.08e-4, thickness: 35e-6, conductivity: 5.8e7 })
    expect(made.status).toBe(201)
    expect(made.body).toMatchObject({ name: 'Invented board B', permittivity: 3.5, height: 5.08e-4, lossTangent: 0, roughness: 0, note: '' })
    await owner.client.post(base, { name: 'Invented board A', permittivity: 2.2, height: 7.87e-4 })
    const listed = await viewer.client.get(base)
    expect(listed.status).toBe(200)
    expect(listed.body.map((b: { name: string }) => b.name)).toEqual(['Invented board A', 'Invented board B'])
    const changed = await owner.client.patch(`${base}/${made.body.id}`, { lossTangent: 0.0027, note: 'checked' })
    expect(changed.body).toMatchObject({ lossTangent: 0.0027, note: 'checked', permittivity: 3.5 })
    expect((await owner.client.delete(`${base}/${made.body.id}`)).status).toBe(200)
    expect((await owner.client.patch(`${base}/${made.body.id}`, { note: 'gone' })).status).toBe(404)
  })

  it('refuses a taken name, values out of range and unknown fields, naming what is wrong', async () => {
    await owner.client.post(base, { name: 'Twice', permittivity: 3, height: 1e-3 })
    const twice = await owner.client.post(base, { name: 'Twice', permittivity: 3, height: 1e-3 })
    expect(twice.status).toBe(409)
    expect(twice.body.message).toContain('already has a substrate called "Twice"')
    const bad = await owner.client.post(base, { name: 'Bad', permittivity: 0.5, height: 1e-3 })
    expect(bad.status).toBe(400)
    expect(JSON.stringify(bad.body)).toContain('Relative permittivity must be at least 1.')
    expect((await owner.client.post(base, { name: 'Extra', permittivity: 3, height: 1e-3, script: '<x>' })).status).toBe(400)
    expect((await viewer.client.post(base, { name: 'Viewer board', permittivity: 3, height: 1e-3 })).status).toBe(403)
  })
})
