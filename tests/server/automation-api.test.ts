import { execFile } from 'node:child_process'
import { promisify } from 'node:util'
import { createHash } from 'node:crypto'
import { readdirSync, readFileSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import pg from 'pg'
import { beforeAll, describe, expect, it } from 'vitest'
import { ApiClient, newSignedInUser, type ApiAnswer } from '../support/http'

// The automation API: personal access tokens made with a session, used as bearer tokens on /api/v1 only.

async function sql(text: string, values: unknown[]) {
  const client = new pg.Client({ connectionString: process.env.PORTWRIGHT_TEST_DATABASE_URL })
  await client.connect()
  try { return await client.query(text, values) } finally { await client.end() }
}

/** A script with a bearer token and no cookie jar in use. */
function bearer(token: string, method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<ApiAnswer> {
  return new ApiClient({ origin: null }).request(method, path, body, { authorization: `Bearer ${token}`, ...headers })
}

const branchLinePath = join(process.cwd(), 'shared', 'examples', 'branch-line-hybrid.json')
const branchLine = JSON.parse(readFileSync(branchLinePath, 'utf8')) as Record<string, unknown>
const tiny = { format: 'portwright.network', version: 1, name: 'Tiny', referenceImpedance: 50, sweep: { start: 1e9, stop: 1e9, points: 1 },
  blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'R', type: 'load', params: { resistance: 50 } }], wires: [['P1.1', 'R.1']] }

type Person = Awaited<ReturnType<typeof newSignedInUser>>
let owner: Person
let member: Person
let projectA: string
let projectB: string
let networkA: string

async function makeToken(person: Person, body: Partial<{ name: string; projects: string[]; roleCeiling: string; expiresInDays: number }> = {}) {
  const answer = await person.client.post('/api/account/tokens', { name: 'Sweep script', projects: [projectA], roleCeiling: 'editor', expiresInDays: 30, ...body })
  expect(answer.status, JSON.stringify(answer.body)).toBe(201)
  return answer.body as { id: string; token: string; hint: string }
}

beforeAll(async () => {
  owner = await newSignedInUser('Automation Owner')
  member = await newSignedInUser('Automation Member')
  projectA = (await owner.client.post('/api/projects', { name: 'Automation A' })).body.id
  projectB = (await owner.client.post('/api/projects', { name: 'Automation B' })).body.id
  await owner.client.post(`/api/projects/${projectA}/members`, { email: member.email, role: 'editor' })
  const made = await owner.client.post(`/api/projects/${projectA}/networks`, { name: 'Branch-line', document: branchLine })
  expect(made.status, JSON.stringify(made.body)).toBe(201)
  networkA = made.body.id
})

describe('personal access tokens', () => {
  it('are shown once, with a recognisable prefix, and stored only as a SHA-256 of the secret', async () => {
    const made = await makeToken(owner)
    expect(made.token).toMatch(/^pwt_[A-Za-z0-9_-]{43}$/)
    const list = await owner.client.get('/api/account/tokens')
    const listed = list.body.find((t: { id: string }) => t.id === made.id)
    expect(listed).toBeDefined()
    expect(JSON.stringify(list.body)).not.toContain(made.token)
    expect(listed.hint).toBe(`${made.token.slice(0, 8)}…`)
    expect(listed.projects).toEqual([{ id: projectA, name: 'Automation A' }])
    const row = (await sql('SELECT * FROM access_tokens WHERE id = $1', [made.id])).rows[0]
    expect(row.token_hash).toBe(createHash('sha256').update(made.token).digest('hex'))
    expect(JSON.stringify(row)).not.toContain(made.token.slice(8))
  })

  it('refuse projects the person is not in, lives over a year and ceilings above editor', async () => {
    const stranger = await newSignedInUser('Automation Stranger')
    const notMine = await stranger.client.post('/api/account/tokens', { name: 'x', projects: [projectA], roleCeiling: 'viewer', expiresInDays: 30 })
    expect(notMine.status).toBe(400)
    expect(notMine.body.data.fields.projects).toMatch(/member/)
    const long = await owner.client.post('/api/account/tokens', { name: 'x', projects: [projectA], roleCeiling: 'viewer', expiresInDays: 366 })
    expect(long.status).toBe(400)
    expect(long.body.data.fields.expiresInDays).toMatch(/at most 365 days/)
    const ownerCeiling = await owner.client.post('/api/account/tokens', { name: 'x', projects: [projectA], roleCeiling: 'owner', expiresInDays: 30 })
    expect(ownerCeiling.status).toBe(400)
  })

  it('never create or list tokens, and sessions never open /api/v1', async () => {
    const made = await makeToken(owner)
    expect((await bearer(made.token, 'GET', '/api/account/tokens')).status).toBe(401)
    expect((await bearer(made.token, 'POST', '/api/account/tokens', { name: 'x', projects: [projectA], roleCeiling: 'viewer', expiresInDays: 1 })).status).toBe(401)
    expect((await bearer(made.token, 'GET', '/api/projects')).status).toBe(401)
    expect((await owner.client.get(`/api/v1/networks?project=${projectA}`)).status).toBe(401)
    expect((await owner.client.post('/api/v1/solve', { document: tiny })).status).toBe(401)
  })

  it('reach only their projects: another project of the same person answers 404', async () => {
    const made = await makeToken(owner)
    const mine = await bearer(made.token, 'GET', `/api/v1/networks?project=${projectA}`)
    expect(mine.status).toBe(200)
    expect(mine.body).toEqual([{ id: networkA, name: 'Branch-line', revision: expect.any(Number), updatedAt: expect.any(String) }])
    expect((await bearer(made.token, 'GET', `/api/v1/networks?project=${projectB}`)).status).toBe(404)
    expect((await bearer(made.token, 'POST', '/api/v1/solve', { project: projectB, network: networkA })).status).toBe(404)
    expect((await bearer(made.token, 'POST', '/api/v1/solve', { document: tiny, project: projectB })).status).toBe(404)
  })

  it('act with the lower of their ceiling and the current membership role, read on every request', async () => {
    const viewerCeiling = await makeToken(owner, { roleCeiling: 'viewer' })
    expect((await bearer(viewerCeiling.token, 'GET', '/api/v1/token')).body.projects).toEqual([{ id: projectA, name: 'Automation A', role: 'viewer' }])
    const ownerEditor = await makeToken(owner, { roleCeiling: 'editor' })
    expect((await bearer(ownerEditor.token, 'GET', '/api/v1/token')).body.projects[0].role).toBe('editor')
    const memberToken = await makeToken(member, { roleCeiling: 'editor' })
    expect((await bearer(memberToken.token, 'GET', '/api/v1/token')).body.projects[0].role).toBe('editor')
    await owner.client.patch(`/api/projects/${projectA}/members/${member.id}`, { role: 'viewer' })
    expect((await bearer(memberToken.token, 'GET', '/api/v1/token')).body.projects[0].role).toBe('viewer')
    await owner.client.patch(`/api/projects/${projectA}/members/${member.id}`, { role: 'editor' })
  })

  it('stop working once expired, with a message saying so', async () => {
    const made = await makeToken(owner)
    await sql(`UPDATE access_tokens SET expires_at = now() - interval '1 second' WHERE id = $1`, [made.id])
    const answer = await bearer(made.token, 'GET', '/api/v1/token')
    expect(answer.status).toBe(401)
    expect(answer.body.message).toMatch(/expired/)
    expect((await owner.client.get('/api/account/tokens')).body.find((t: { id: string }) => t.id === made.id).expired).toBe(true)
  })

  it('stop working at once when revoked, and only their owner can revoke them', async () => {
    const made = await makeToken(owner)
    expect((await bearer(made.token, 'GET', '/api/v1/token')).status).toBe(200)
    expect((await member.client.delete(`/api/account/tokens/${made.id}`)).status).toBe(404)
    expect((await owner.client.delete(`/api/account/tokens/${made.id}`)).status).toBe(200)
    expect((await bearer(made.token, 'GET', '/api/v1/token')).status).toBe(401)
  })

  it('lose a project at once when their owner is removed from it', async () => {
    const leaver = await newSignedInUser('Automation Leaver')
    await owner.client.post(`/api/projects/${projectA}/members`, { email: leaver.email, role: 'viewer' })
    const made = await makeToken(leaver)
    expect((await bearer(made.token, 'GET', `/api/v1/networks?project=${projectA}`)).status).toBe(200)
    expect((await owner.client.delete(`/api/projects/${projectA}/members/${leaver.id}`)).status).toBe(200)
    expect((await bearer(made.token, 'GET', `/api/v1/networks?project=${projectA}`)).status).toBe(404)
    expect((await bearer(made.token, 'POST', '/api/v1/solve', { project: projectA, network: networkA })).status).toBe(404)
  })

  it('show when they were last used, written at most once a minute', async () => {
    const made = await makeToken(owner)
    const lastUse = async () => (await owner.client.get('/api/account/tokens')).body.find((t: { id: string }) => t.id === made.id).lastUsedAt
    expect(await lastUse()).toBeNull()
    await bearer(made.token, 'GET', '/api/v1/token')
    const first = await lastUse()
    expect(Date.now() - Date.parse(first)).toBeLessThan(60_000)
    await bearer(made.token, 'GET', '/api/v1/token')
    expect(await lastUse()).toBe(first)
    await sql(`UPDATE access_tokens SET last_used_at = now() - interval '2 minutes' WHERE id = $1`, [made.id])
    await bearer(made.token, 'GET', '/api/v1/token')
    expect(Date.now() - Date.parse(await lastUse())).toBeLessThan(60_000)
  })
})

/** `npm run -s solve -- branch-line --format json [...]`, run without blocking the event loop (kept-alive sockets stay sound). */
async function cliSolve(...extra: string[]): Promise<unknown> {
  const { stdout } = await promisify(execFile)('npm', ['run', '-s', 'solve', '--', branchLinePath, '--format', 'json', ...extra], { encoding: 'utf8', maxBuffer: 64 << 20 })
  return JSON.parse(stdout)
}

describe('POST /api/v1/solve', () => {
  let token: string
  let cliWhole: unknown
  let cliFive: unknown
  beforeAll(async () => {
    const [made, whole, five] = await Promise.all([makeToken(owner, { name: 'Solver' }), cliSolve(), cliSolve('--points', '5')])
    token = made.token
    cliWhole = whole
    cliFive = five
  }, 120_000)

  /** |a − b| ≤ tol everywhere in two answers of the contract's shape. */
  function expectSameSolve(api: any, cli: any, tol: number) {
    expect(Object.keys(api)).toEqual(['ports', 'impedances', 'frequencies', 's'])
    expect(api.ports).toBe(cli.ports)
    expect(api.impedances).toEqual(cli.impedances)
    expect(api.frequencies).toEqual(cli.frequencies)
    let worst = 0
    cli.s.forEach((m: number[][][], k: number) => m.forEach((row, i) => row.forEach(([re, im], j) => {
      const [aRe, aIm] = api.s[k][i][j]
      worst = Math.max(worst, Math.abs(aRe - re!), Math.abs(aIm - im!))
    })))
    expect(worst).toBeLessThanOrEqual(tol)
  }

  it('answers a document exactly as `npm run -s solve -- --format json` does (branch-line example, within 1e-12)', async () => {
    const answer = await bearer(token, 'POST', '/api/v1/solve', { document: branchLine })
    expect(answer.status, JSON.stringify(answer.body)).toBe(200)
    expect(answer.body.frequencies).toHaveLength(251)
    expectSameSolve(answer.body, cliWhole, 1e-12)
  })

  it('answers a stored network and applies a sweep override, as --points does', async () => {
    const answer = await bearer(token, 'POST', '/api/v1/solve', { project: projectA, network: networkA, sweep: { points: 5 } })
    expect(answer.status, JSON.stringify(answer.body)).toBe(200)
    expectSameSolve(answer.body, cliFive, 1e-12)
  })

  it('gives the ideal quadrature hybrid at its centre frequency', async () => {
    // Pozar, Microwave Engineering, 4th ed., §7.5, eq. (7.55) [memory for the equation number]: S21 = −j/√2, S31 = −1/√2, S11 = S41 = 0 at f0.
    const answer = await bearer(token, 'POST', '/api/v1/solve', { document: branchLine, sweep: { start: '2.45 GHz', points: 1 } })
    expect(answer.status).toBe(200)
    const column = answer.body.s[0].map((row: number[][]) => row[0])
    const h = Math.SQRT1_2
    const expected = [[0, 0], [0, -h], [-h, 0], [0, 0]]
    column.forEach(([re, im]: number[], i: number) => {
      expect(re).toBeCloseTo(expected[i]![0]!, 12)
      expect(im).toBeCloseTo(expected[i]![1]!, 12)
    })
  })

  it('resolves subnetworks from the same project, and only there', async () => {
    const inner = { format: 'portwright.network', version: 1, name: 'Quarter line', referenceImpedance: 50,
      blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } }, { id: 'L', type: 'line', params: { impedance: 50, degrees: 90, at: 1e9 } }],
      wires: [['P1.1', 'L.1'], ['L.2', 'P2.1']] }
    expect((await owner.client.post(`/api/projects/${projectA}/networks`, { name: 'Quarter line', document: inner })).status).toBe(201)
    const outer = { format: 'portwright.network', version: 1, name: 'Two quarters', referenceImpedance: 50, sweep: { start: 1e9, stop: 1e9, points: 1 },
      blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } },
        { id: 'A', type: 'subnetwork', params: { network: 'Quarter line' } }, { id: 'B', type: 'subnetwork', params: { network: 'Quarter line' } }],
      wires: [['P1.1', 'A.1'], ['A.2', 'B.1'], ['B.2', 'P2.1']] }
    const solved = await bearer(token, 'POST', '/api/v1/solve', { document: outer, project: projectA })
    expect(solved.status, JSON.stringify(solved.body)).toBe(200)
    // Two matched 90° lines make a matched 180° line: S21 = e^{−jπ} = −1 (common practice).
    expect(solved.body.s[0][1][0][0]).toBeCloseTo(-1, 12)
    expect(solved.body.s[0][1][0][1]).toBeCloseTo(0, 12)
    const alone = await bearer(token, 'POST', '/api/v1/solve', { document: outer })
    expect(alone.status).toBe(422)
    expect(alone.body.problems.join(' ')).toMatch(/A|Quarter line/)
  })

  it('answers a bad document 422 with its problems in plain words, naming the block', async () => {
    const bad = { ...tiny, blocks: [...tiny.blocks, { id: 'X9', type: 'line', params: { impedance: '50 GHz', degrees: 90, at: 1e9 } }] }
    const answer = await bearer(token, 'POST', '/api/v1/solve', { document: bad })
    expect(answer.status).toBe(422)
    expect(answer.body.problems.some((p: string) => p.includes('X9'))).toBe(true)
    const shape = await bearer(token, 'POST', '/api/v1/solve', { document: tiny, network: networkA })
    expect(shape.status).toBe(400)
    const over = await bearer(token, 'POST', '/api/v1/solve', { document: tiny, sweep: { points: 20_002 } })
    expect(over.status).toBe(400)
    expect(over.body.message).toMatch(/sweep.points: At most 20,001 points per request/)
  })

  it('attack: a heavy but allowed solve is stopped at the time budget with 422 while the server answers others', async () => {
    const inner = `Heavy inner ${crypto.randomUUID()}`
    const chain = (next: string | null) => {
      const ids = Array.from({ length: 135 }, (_, i) => `B${i}`)
      return {
        format: 'portwright.network', version: 1, name: 'Heavy', referenceImpedance: 50,
        sweep: { start: 1e9, stop: 2e9, points: 20_001 },
        blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } },
          ...ids.map(id => (next ? { id, type: 'subnetwork', params: { network: next } } : { id, type: 'line', params: { impedance: 50, degrees: 90, at: 1e9 } }))],
        wires: [['P1.1', 'B0.1'], ...ids.slice(1).map((id, i) => [`B${i}.2`, `${id}.1`]), ['B134.2', 'P2.1']],
      }
    }
    expect((await owner.client.post(`/api/projects/${projectA}/networks`, { name: inner, document: chain(null) })).status).toBe(201)
    const started = performance.now()
    const heavy = bearer(token, 'POST', '/api/v1/solve', { document: chain(inner), project: projectA })
    const health = performance.now()
    expect((await new ApiClient().get('/api/health')).status).toBe(200)
    const healthMs = performance.now() - health
    const answer = await heavy
    const elapsed = performance.now() - started
    expect(answer.status).toBe(422)
    expect(answer.body.problems[0]).toMatch(/took longer than 3 s to solve on the server/)
    // Bounds, not speed targets: the refusal comes near the test run's 3 s budget, and health stays free.
    expect(elapsed).toBeLessThan(15_000)
    expect(healthMs).toBeLessThan(1_000)
    console.log(`hostile API solve refused after ${elapsed.toFixed(0)} ms; health ${healthMs.toFixed(0)} ms`)
  })

  it('refuses an answer with more S-parameter values than one request may hold', async () => {
    // 8 × 8 values × 20,001 points = 1,280,064: over 500,000; 500,000 / 64 = 7,812 points (derived by hand).
    const ports = 8
    const wide = { format: 'portwright.network', version: 1, name: 'Eight loads', referenceImpedance: 50, sweep: { start: 1e9, stop: 2e9, points: 20_001 },
      blocks: Array.from({ length: ports }, (_, i) => [{ id: `P${i + 1}`, type: 'port', params: { index: i + 1 } }, { id: `R${i + 1}`, type: 'load', params: { resistance: 50 } }]).flat(),
      wires: Array.from({ length: ports }, (_, i) => [`P${i + 1}.1`, `R${i + 1}.1`]) }
    const tooWide = await bearer(token, 'POST', '/api/v1/solve', { document: wide })
    expect(tooWide.status).toBe(422)
    expect(tooWide.body.problems[0]).toMatch(/1,280,064 S-parameter values .* at most 500,000 .* 7,812 points or fewer/)
  })

  it('passes the same-site check without a cookie, but not with one from another site', async () => {
    const fromScript = await bearer(token, 'POST', '/api/v1/solve', { document: tiny }, { origin: 'https://elsewhere.example' })
    expect(fromScript.status).toBe(200)
    const withCookie = await bearer(token, 'POST', '/api/v1/solve', { document: tiny }, { origin: 'https://elsewhere.example', cookie: owner.client.cookie })
    expect(withCookie.status).toBe(403)
  })

  it('carries the simulation caution in a header', async () => {
    const response = await fetch(`${process.env.PORTWRIGHT_TEST_URL}/api/v1/solve`, {
      method: 'POST', headers: { 'authorization': `Bearer ${token}`, 'content-type': 'application/json' }, body: JSON.stringify({ document: tiny }),
    })
    expect(response.status).toBe(200)
    expect(response.headers.get('content-type')).toMatch(/^application\/json/)
    expect(response.headers.get('portwright-caution')).toMatch(/verify hardware by measurement/)
  })

  it('limits each token to 60 solves a minute: 429 with Retry-After', async () => {
    const limited = (await makeToken(owner, { name: 'Busy script' })).token
    const statuses: number[] = []
    for (let i = 0; i < 60; i++) statuses.push((await bearer(limited, 'POST', '/api/v1/solve', { document: tiny })).status)
    expect(statuses.every(s => s === 200)).toBe(true)
    const response = await fetch(`${process.env.PORTWRIGHT_TEST_URL}/api/v1/solve`, {
      method: 'POST', headers: { 'authorization': `Bearer ${limited}`, 'content-type': 'application/json' }, body: JSON.stringify({ document: tiny }),
    })
    expect(response.status).toBe(429)
    const wait = Number(response.headers.get('retry-after'))
    expect(wait).toBeGreaterThanOrEqual(1)
    expect(wait).toBeLessThanOrEqual(60)
    // Another token of the same person is counted on its own.
    expect((await bearer(token, 'POST', '/api/v1/solve', { document: tiny })).status).toBe(200)
  })
})

describe('GET /api/v1/openapi.json', () => {
  it('is an OpenAPI 3.1 description naming every /api/v1 route with its method', async () => {
    const answer = await new ApiClient().get('/api/v1/openapi.json')
    expect(answer.status).toBe(200)
    expect(answer.body.openapi).toBe('3.1.0')
    const dir = join(process.cwd(), 'server', 'api', 'v1')
    const walk = (d: string): string[] => readdirSync(d).flatMap(n => statSync(join(d, n)).isDirectory() ? walk(join(d, n)) : [relative(dir, join(d, n))])
    const routes = walk(dir).map((file) => {
      const [, path, method] = file.match(/^(.*)\.(get|post|put|patch|delete)\.ts$/)!
      return `${method} /api/v1/${path}`
    }).sort()
    const described = Object.entries(answer.body.paths as Record<string, Record<string, unknown>>)
      .flatMap(([path, methods]) => Object.keys(methods).map(m => `${m} ${path}`)).sort()
    expect(described).toEqual(routes)
    expect(answer.body.paths['/api/v1/solve'].post.responses['429'].headers['Retry-After']).toBeDefined()
  })
})
