import { beforeAll, describe, expect, it } from 'vitest'
import { ApiClient, newSignedInUser, signedIn } from '../support/http'
import { mailDuring } from '../support/mail'

describe('health', () => {
  it('reports the app and a really queried database as ok', async () => {
    const answer = await new ApiClient().get('/api/health')
    expect(answer).toEqual({ status: 200, body: { status: 'ok', database: 'ok' } })
  })
})

describe('projects and members', () => {
  let owner: Awaited<ReturnType<typeof newSignedInUser>>
  let colleague: Awaited<ReturnType<typeof newSignedInUser>>
  let projectId: string

  beforeAll(async () => {
    owner = await newSignedInUser('Owner Person')
    colleague = await newSignedInUser('Colleague Person')
    projectId = (await owner.client.post('/api/projects', { name: 'Hybrid lab work' })).body.id
  })

  it('makes the creator the owner and lists the project for them only', async () => {
    const mine = await owner.client.get('/api/projects')
    expect(mine.body.find((p: { id: string }) => p.id === projectId)).toMatchObject({ name: 'Hybrid lab work', role: 'owner' })
    const theirs = await colleague.client.get('/api/projects')
    expect(theirs.body.find((p: { id: string }) => p.id === projectId)).toBeUndefined()
  })

  it('refuses an empty project name, naming the field', async () => {
    const answer = await owner.client.post('/api/projects', { name: '   ' })
    expect(answer.status).toBe(400)
    expect(answer.body.data.fields.name).toMatch(/project name/i)
  })

  it('adds a member by e-mail, refuses unknown and duplicate e-mails', async () => {
    expect((await owner.client.post(`/api/projects/${projectId}/members`, { email: colleague.email, role: 'editor' })).status).toBe(201)
    const again = await owner.client.post(`/api/projects/${projectId}/members`, { email: colleague.email, role: 'viewer' })
    expect(again.status).toBe(409)
    const unknown = await owner.client.post(`/api/projects/${projectId}/members`, { email: 'nobody@nowhere.example', role: 'viewer' })
    expect(unknown.status).toBe(404)
    expect(unknown.body.message).toMatch(/No account uses nobody@nowhere\.example/)
    const members = await colleague.client.get(`/api/projects/${projectId}/members`)
    expect(members.body.map((m: { name: string; role: string }) => [m.name, m.role])).toEqual([['Owner Person', 'owner'], ['Colleague Person', 'editor']])
  })

  it('refuses an unknown role by name', async () => {
    const answer = await owner.client.patch(`/api/projects/${projectId}/members/${colleague.id}`, { role: 'admin' })
    expect(answer.status).toBe(400)
    expect(answer.body.message).toMatch(/owner, editor, reviewer, viewer/)
  })

  it('never lets the last owner be demoted or removed', async () => {
    const demote = await owner.client.patch(`/api/projects/${projectId}/members/${owner.id}`, { role: 'editor' })
    expect(demote.status).toBe(409)
    expect(demote.body.message).toMatch(/at least one owner/)
    const remove = await owner.client.delete(`/api/projects/${projectId}/members/${owner.id}`)
    expect(remove.status).toBe(409)
    // With a second owner, the first may step down.
    await owner.client.patch(`/api/projects/${projectId}/members/${colleague.id}`, { role: 'owner' })
    expect((await owner.client.patch(`/api/projects/${projectId}/members/${owner.id}`, { role: 'editor' })).status).toBe(200)
  })

  it('reads the role from the database on every request: a demoted member loses rights at once', async () => {
    const p = (await owner.client.post('/api/projects', { name: 'Demotion' })).body.id
    const member = await newSignedInUser('Soon Viewer')
    await owner.client.post(`/api/projects/${p}/members`, { email: member.email, role: 'editor' })
    expect((await member.client.post(`/api/projects/${p}/networks`, { name: 'Allowed' })).status).toBe(201)
    await owner.client.patch(`/api/projects/${p}/members/${member.id}`, { role: 'viewer' })
    expect((await member.client.post(`/api/projects/${p}/networks`, { name: 'Refused' })).status).toBe(403)
    await owner.client.delete(`/api/projects/${p}/members/${member.id}`)
    expect((await member.client.get(`/api/projects/${p}`)).status).toBe(404)
  })

  it('renames and deletes a project (owner)', async () => {
    const p = (await owner.client.post('/api/projects', { name: 'Temporary' })).body.id
    expect((await owner.client.patch(`/api/projects/${p}`, { name: 'Renamed' })).body.name).toBe('Renamed')
    expect((await owner.client.delete(`/api/projects/${p}`)).status).toBe(200)
    expect((await owner.client.get(`/api/projects/${p}`)).status).toBe(404)
  })

  it('answers 404 for a malformed project id', async () => {
    expect((await owner.client.get('/api/projects/not-a-uuid')).status).toBe(404)
  })
})

describe('demo data', () => {
  it('lets a demo user sign in and see the demo project and its networks', async () => {
    const ines = await signedIn('ines@quillmere.example', 'quillmere-demo-2026')
    const projects = await ines.get('/api/projects')
    const beam = projects.body.find((p: { name: string }) => p.name === 'Beam-switch feed, S-band')
    expect(beam.role).toBe('owner')
    const networks = await ines.get(`/api/projects/${beam.id}/networks`)
    expect(networks.body.length).toBeGreaterThanOrEqual(3)
  })
})

describe('notice to a member added by e-mail', () => {
  it('mails the new member (only them) who added them, to which project and role, with a link', async () => {
    const owner = await newSignedInUser('Notice Owner')
    const added = await newSignedInUser('Notice Added')
    const bystander = await newSignedInUser('Notice Bystander')
    const projectId = (await owner.client.post('/api/projects', { name: 'Notice bench' })).body.id
    let status = 0
    const mail = await mailDuring([owner.email, added.email, bystander.email], async () => {
      status = (await owner.client.post(`/api/projects/${projectId}/members`, { email: added.email, role: 'reviewer' })).status
    })
    expect(status).toBe(201)
    expect(mail).toHaveLength(1)
    expect(mail[0]!.to).toEqual([added.email])
    expect(mail[0]!.subject).toBe('You were added to “Notice bench” on Portwright')
    expect(mail[0]!.text).toContain('Notice Owner added you to the project “Notice bench” on Portwright as reviewer')
    expect(mail[0]!.text).toContain(`/projects/${projectId}`)
    expect(mail[0]!.html).toContain(`/projects/${projectId}"`)
  })
})
