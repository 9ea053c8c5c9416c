import { readdirSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import { beforeAll, describe, expect, it } from 'vitest'
import { ApiClient, newSignedInUser } from '../support/http'

/**
 * Every API route × every kind of caller. The table is the access policy; the
 * test discovers the route files, so a new route without a row fails here, and a
 * route that forgets its check answers a refused caller with 2xx and fails too.
 */
type Actor = 'anonymous' | 'outsider' | 'viewer' | 'reviewer' | 'editor' | 'owner'
type Rule = 'public' | 'signed-in' | 'viewer' | 'reviewer' | 'editor' | 'owner'

const actors: Actor[] = ['anonymous', 'outsider', 'viewer', 'reviewer', 'editor', 'owner']
const rank: Record<string, number> = { viewer: 0, reviewer: 1, editor: 2, owner: 3 }

interface Fixture {
  clients: Record<Exclude<Actor, 'anonymous'>, ApiClient> & { anonymous: ApiClient }
  owner: ApiClient
  projectId: string
  networkId: string
  targetUserId: string
  spare: { id: string; email: string }
}

interface RouteCase {
  rule: Rule
  /** Makes whatever the call acts on and returns its path and body. */
  prepare: (f: Fixture, actor: Actor) => Promise<{ path: string; body?: unknown }>
}

const networkDoc = (name: string) => ({ format: 'portwright.network', version: 1, name, referenceImpedance: 50, blocks: [], wires: [] })

const policy: Record<string, RouteCase> = {
  'GET /api/health': { rule: 'public', prepare: async () => ({ path: '/api/health' }) },
  'POST /api/auth/signup': { rule: 'public', prepare: async () => ({ path: '/api/auth/signup', body: { email: `m-${crypto.randomUUID()}@test.example`, name: 'Matrix', password: 'matrix-password-123' } }) },
  'POST /api/auth/signin': { rule: 'public', prepare: async (f) => ({ path: '/api/auth/signin', body: { email: f.spare.email, password: 'test-password-long-enough' } }) },
  'POST /api/auth/signout': { rule: 'public', prepare: async () => ({ path: '/api/auth/signout' }) },
  'POST /api/auth/signout-everywhere': { rule: 'signed-in', prepare: async () => ({ path: '/api/auth/signout-everywhere' }) },
  'GET /api/auth/me': { rule: 'signed-in', prepare: async () => ({ path: '/api/auth/me' }) },
  'GET /api/projects': { rule: 'signed-in', prepare: async () => ({ path: '/api/projects' }) },
  'POST /api/projects': { rule: 'signed-in', prepare: async () => ({ path: '/api/projects', body: { name: 'Matrix project' } }) },
  'GET /api/projects/:projectId': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}` }) },
  'PATCH /api/projects/:projectId': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}`, body: { name: 'Renamed by matrix' } }) },
  'DELETE /api/projects/:projectId': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${await throwawayProject(f)}` }) },
  'GET /api/projects/:projectId/members': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/members` }) },
  'POST /api/projects/:projectId/members': {
    rule: 'owner',
    prepare: async (f) => {
      await f.owner.delete(`/api/projects/${f.projectId}/members/${f.spare.id}`)
      return { path: `/api/projects/${f.projectId}/members`, body: { email: f.spare.email, role: 'viewer' } }
    },
  },
  'PATCH /api/projects/:projectId/members/:userId': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/members/${f.targetUserId}`, body: { role: 'reviewer' } }) },
  'DELETE /api/projects/:projectId/members/:userId': {
    rule: 'owner',
    prepare: async (f) => {
      await f.owner.post(`/api/projects/${f.projectId}/members`, { email: f.spare.email, role: 'viewer' })
      return { path: `/api/projects/${f.projectId}/members/${f.spare.id}` }
    },
  },
  'GET /api/projects/:projectId/networks': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/networks` }) },
  'POST /api/projects/:projectId/networks': { rule: 'editor', prepare: async f => ({ path: `/api/projects/${f.projectId}/networks`, body: { name: 'Matrix network' } }) },
  'GET /api/projects/:projectId/networks/:networkId': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/networks/${f.networkId}` }) },
  'PUT /api/projects/:projectId/networks/:networkId': {
    rule: 'editor',
    prepare: async (f) => {
      const current = await f.owner.get(`/api/projects/${f.projectId}/networks/${f.networkId}`)
      return { path: `/api/projects/${f.projectId}/networks/${f.networkId}`, body: { revision: current.body.revision, document: networkDoc('Matrix network') } }
    },
  },
  'DELETE /api/projects/:projectId/networks/:networkId': {
    rule: 'editor',
    prepare: async (f) => {
      const made = await f.owner.post(`/api/projects/${f.projectId}/networks`, { name: 'Doomed network' })
      return { path: `/api/projects/${f.projectId}/networks/${made.body.id}` }
    },
  },
}

/** A second project with the same members, for calls that delete a project. */
async function throwawayProject(f: Fixture): Promise<string> {
  const made = await f.owner.post('/api/projects', { name: 'Throwaway' })
  for (const role of ['viewer', 'reviewer', 'editor'] as const) {
    const me = await f.clients[role].get('/api/auth/me')
    const email = me.body.email
    await f.owner.post(`/api/projects/${made.body.id}/members`, { email, role })
  }
  return made.body.id
}

/** Every route file under server/api as "METHOD /api/path/:param". */
function discoverRoutes(): string[] {
  const root = join(process.cwd(), 'server', 'api')
  const files: string[] = []
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = join(dir, name)
      if (statSync(full).isDirectory()) walk(full)
      else if (/\.(get|post|put|patch|delete)\.ts$/.test(name)) files.push(relative(root, full))
    }
  }
  walk(root)
  return files.map((file) => {
    const [, path, method] = file.match(/^(.*)\.(get|post|put|patch|delete)\.ts$/)!
    const url = `/api/${path}`.replace(/\/index$/, '').replace(/\[(\w+)\]/g, ':$1')
    return `${method!.toUpperCase()} ${url}`
  }).sort()
}

function expectedStatus(rule: Rule, actor: Actor): 'allowed' | number {
  if (rule === 'public') return 'allowed'
  if (actor === 'anonymous') return 401
  if (rule === 'signed-in') return 'allowed'
  if (actor === 'outsider') return 404
  return rank[actor]! >= rank[rule]! ? 'allowed' : 403
}

let fixture: Fixture

beforeAll(async () => {
  const owner = await newSignedInUser('Matrix Owner')
  const others = {} as Record<'viewer' | 'reviewer' | 'editor' | 'outsider' | 'target', Awaited<ReturnType<typeof newSignedInUser>>>
  for (const key of ['viewer', 'reviewer', 'editor', 'outsider', 'target'] as const) others[key] = await newSignedInUser(`Matrix ${key}`)
  const spare = await newSignedInUser('Matrix spare')
  const project = await owner.client.post('/api/projects', { name: 'Role matrix' })
  const projectId = project.body.id
  for (const role of ['viewer', 'reviewer', 'editor'] as const) {
    await owner.client.post(`/api/projects/${projectId}/members`, { email: others[role].email, role })
  }
  await owner.client.post(`/api/projects/${projectId}/members`, { email: others.target.email, role: 'viewer' })
  const network = await owner.client.post(`/api/projects/${projectId}/networks`, { name: 'Matrix network' })
  fixture = {
    owner: owner.client,
    clients: { anonymous: new ApiClient(), outsider: others.outsider.client, viewer: others.viewer.client, reviewer: others.reviewer.client, editor: others.editor.client, owner: owner.client },
    projectId,
    networkId: network.body.id,
    targetUserId: others.target.id,
    spare: { id: spare.id, email: spare.email },
  }
})

describe('role matrix', () => {
  it('covers every API route file', () => {
    expect(discoverRoutes()).toEqual(Object.keys(policy).sort())
  })

  for (const [route, spec] of Object.entries(policy)) {
    const method = route.split(' ')[0]!
    for (const actor of actors) {
      const expected = expectedStatus(spec.rule, actor)
      it(`${route} as ${actor} → ${expected}`, async () => {
        const { path, body } = await spec.prepare(fixture, actor)
        // Session-ending routes get a fresh session of the same person, so later cases keep theirs.
        const client = actor === 'anonymous' ? new ApiClient() : await sessionFor(actor, route)
        const answer = await client.request(method, path, body ?? (method === 'GET' ? undefined : {}))
        if (expected === 'allowed') expect(answer.status, JSON.stringify(answer.body)).toBeLessThan(300)
        else expect(answer.status, JSON.stringify(answer.body)).toBe(expected)
      })
    }
  }
})

async function sessionFor(actor: Exclude<Actor, 'anonymous'>, route: string): Promise<ApiClient> {
  // Routes that start or end a session would replace or revoke the shared clients' cookies.
  const touchesSession = /\/auth\/(signin|signup|signout|signout-everywhere)$/.test(route)
  return touchesSession ? (await newSignedInUser('Matrix bystander')).client : fixture.clients[actor]
}
