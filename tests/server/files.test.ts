// Project data files: Touchstone uploads checked at the door, listed, downloaded, replaced and deleted.
import { beforeAll, describe, expect, it } from 'vitest'
import { fileForm, newSignedInUser, signedIn } from '../support/http'

// Our own invented two-port: a matched 6 dB pad at 1–3 GHz (|S21| = 0.5), Touchstone 1.1, MA.
const PAD = '! Quillmere pad\n# GHZ S MA R 50\n1 0 0 0.5 0 0.5 0 0 0\n2 0 0 0.5 -10 0.5 -10 0 0\n3 0 0 0.5 -20 0.5 -20 0 0\n'

const withData = (name: string, file: string) => ({
  format: 'portwright.network', version: 1.1, name, referenceImpedance: 50,
  sweep: { start: '1 GHz', stop: '3 GHz', points: 3 },
  blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } }, { id: 'D', type: 'data', params: { file } }],
  wires: [['P1.1', 'D.1'], ['D.2', 'P2.1']],
})

describe('project files', () => {
  let owner: Awaited<ReturnType<typeof newSignedInUser>>
  let viewer: Awaited<ReturnType<typeof newSignedInUser>>
  let projectId = ''
  let base = ''

  beforeAll(async () => {
    owner = await newSignedInUser('Files Owner')
    viewer = await newSignedInUser('Files Viewer')
    projectId = (await owner.client.post('/api/projects', { name: 'Files' })).body.id
    await owner.client.post(`/api/projects/${projectId}/members`, { email: viewer.email, role: 'viewer' })
    base = `/api/projects/${projectId}/files`
  })

  it('uploads a Touchstone file and lists what it holds', async () => {
    const made = await owner.client.request('POST', base, fileForm('pad.s2p', PAD))
    expect(made.status).toBe(201)
    expect(made.body).toMatchObject({
      name: 'pad.s2p', size: PAD.length, version: 1, uploadedBy: 'Files Owner',
      summary: { ports: 2, startFrequency: 1e9, stopFrequency: 3e9, points: 3, impedances: [50, 50], version: '1', parameter: 'S', format: 'MA', noisePoints: 0 },
    })
    const list = await viewer.client.get(base)
    expect(list.status).toBe(200)
    expect(list.body.map((f: { name: string }) => f.name)).toEqual(['pad.s2p'])
    // The project page lists it in its Files section, with the upload limit stated.
    const page = await owner.client.get(`/projects/${projectId}`)
    expect(page.status).toBe(200)
    expect(page.body).toMatch(/data-testid="project-files"/)
    expect(page.body).toMatch(/pad\.s2p/)
    expect(page.body).toMatch(/at most 8 MiB each/)
  })

  it('refuses a wrong extension, content that does not read, a port count that differs from the name, a duplicate name and an oversized file', async () => {
    const wrongName = await owner.client.request('POST', base, fileForm('pad.txt', PAD))
    expect(wrongName.status).toBe(400)
    expect(wrongName.body.message).toMatch(/must end in \.sNp/)
    const broken = await owner.client.request('POST', base, fileForm('broken.s2p', '# GHZ S MA R 50\n2 0 0 1 0 1 0 0 0\n1 0 0 1 0 1 0 0 0\n'))
    expect(broken.status).toBe(400)
    expect(broken.body.message).toBe('broken.s2p is not a Touchstone file we can read: line 3: the frequency 1 GHz is not above the one before it (2 GHz); frequencies must increase.')
    expect((await owner.client.request('POST', base, fileForm('pad.s3p', PAD))).status).toBe(400)
    const again = await owner.client.request('POST', base, fileForm('pad.s2p', PAD))
    expect(again.status).toBe(409)
    expect(again.body.message).toMatch(/replace it with a new version/)
    const huge = await owner.client.request('POST', base, fileForm('huge.s1p', `# GHZ S RI R 50\n${'!'.repeat(8 * 1024 * 1024)}\n1 0 0\n`))
    expect(huge.status).toBe(413)
  })

  it('downloads the bytes as stored, and gives the parsed data to the editor', async () => {
    const list = await viewer.client.get(base)
    const id = list.body[0].id
    const download = await viewer.client.get(`${base}/${id}`)
    expect(download.status).toBe(200)
    expect(download.body).toBe(PAD)
    const data = await viewer.client.get(`${base}/${id}/data`)
    expect(data.body).toMatchObject({ name: 'pad.s2p', ports: 2, impedances: [50, 50], frequencies: [1e9, 2e9, 3e9] })
    // S21 at 2 GHz: 0.5∠−10° (row order S11 S21 S12 S22 of version 1 two-ports).
    expect(data.body.re[4 + 2]).toBeCloseTo(0.5 * Math.cos((-10 * Math.PI) / 180), 12)
    expect(data.body.im[4 + 2]).toBeCloseTo(0.5 * Math.sin((-10 * Math.PI) / 180), 12)
  })

  it('replaces a file with a new version under the same name', async () => {
    const id = (await owner.client.get(base)).body[0].id
    const replaced = await owner.client.request('PUT', `${base}/${id}`, fileForm('pad-v2.s2p', PAD.replace('3 0 0 0.5 -20 0.5 -20 0 0\n', '3 0 0 0.5 -20 0.5 -20 0 0\n4 0 0 0.5 -30 0.5 -30 0 0\n')))
    expect(replaced.status).toBe(200)
    expect(replaced.body).toMatchObject({ name: 'pad.s2p', version: 2, summary: { points: 4, stopFrequency: 4e9 } })
    expect((await owner.client.request('PUT', `${base}/${id}`, fileForm('pad.s2p', 'not touchstone'))).status).toBe(400)
    expect((await owner.client.get(base)).body[0].version).toBe(2)
  })

  it('a snapshot of a network with a data block is summarised from the project\'s file', async () => {
    const network = await owner.client.post(`/api/projects/${projectId}/networks`, { name: 'Pad summary', document: withData('Pad summary', 'pad.s2p') })
    const snapshot = await owner.client.post(`/api/projects/${projectId}/networks/${network.body.id}/snapshots`, { title: 'Pad' })
    expect(snapshot.status).toBe(201)
    expect(snapshot.body.summary.solved, JSON.stringify(snapshot.body.summary)).toBe(true)
    // |S21| = 0.5 throughout the file: 6.02 dB of insertion loss (20·log10 2, common practice).
    expect(JSON.stringify(snapshot.body.summary)).toMatch(/6\.02/)
    expect((await owner.client.delete(`/api/projects/${projectId}/networks/${network.body.id}`)).status).toBe(200)
  })

  it('refuses to delete a file a network uses, naming the network; deletes it once unused', async () => {
    const id = (await owner.client.get(base)).body[0].id
    const network = await owner.client.post(`/api/projects/${projectId}/networks`, { name: 'Pad test', document: withData('Pad test', 'pad.s2p') })
    expect(network.status).toBe(201)
    const refused = await owner.client.delete(`${base}/${id}`)
    expect(refused.status).toBe(409)
    expect(refused.body.message).toBe('pad.s2p is used by "Pad test"; remove its data blocks there first.')
    expect((await owner.client.delete(`/api/projects/${projectId}/networks/${network.body.id}`)).status).toBe(200)
    expect((await owner.client.delete(`${base}/${id}`)).status).toBe(200)
    expect((await owner.client.get(base)).body).toEqual([])
  })

  it('the demo project of balanced amplifiers holds the invented data files and the networks that use them', async () => {
    // Read only: the demo database is shared by the test files.
    const tomas = await signedIn('tomas@quillmere.example', 'quillmere-demo-2026')
    const projects = (await tomas.get('/api/projects')).body as Array<{ id: string; name: string }>
    const demo = projects.find(p => p.name === 'Balanced LNA hybrids')!
    const files = (await tomas.get(`/api/projects/${demo.id}/files`)).body as Array<{ name: string; summary: { ports: number; points: number } }>
    expect(files.map(f => [f.name, f.summary.ports, f.summary.points]).sort()).toEqual([['bandpass-invented.s2p', 2, 201], ['lna-invented.s2p', 2, 91]])
    const networks = (await tomas.get(`/api/projects/${demo.id}/networks`)).body as Array<{ name: string }>
    expect(networks.map(n => n.name)).toEqual(expect.arrayContaining(['Balanced amplifier (invented LNA data)', 'Single amplifier (invented LNA data)']))
  })
})
