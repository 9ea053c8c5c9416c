import { readdirSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import { beforeAll, describe, expect, it } from 'vitest'
import { ApiClient, fileForm, newSignedInUser, signedIn } from '../support/http'
import { invitationToken, mailDuring, outboxList } from '../support/mail'

/**
 * Every API route × every kind of caller. The table is the access policy; the
 * test discovers the route files, so a new route without a row fails here, and a
 * route that forgets its check answers a refused caller with 2xx and fails too.
 */
// 'admin' is the demo site administrator, a member of no project; rule 'admin' is for site-administrator routes.
type Actor = 'anonymous' | 'outsider' | 'admin' | 'viewer' | 'reviewer' | 'editor' | 'owner'
type Rule = 'public' | 'signed-in' | 'admin' | 'viewer' | 'reviewer' | 'editor' | 'owner'

const actors: Actor[] = ['anonymous', 'outsider', 'admin', 'viewer', 'reviewer', 'editor', 'owner']
const rank: Record<string, number> = { viewer: 0, reviewer: 1, editor: 2, owner: 3 }

interface Fixture {
  clients: Record<Exclude<Actor, 'anonymous'>, ApiClient> & { anonymous: ApiClient }
  owner: ApiClient
  projectId: string
  networkId: string
  targetUserId: string
  spare: { id: string; email: string }
  /** User ids of the project members by role. */
  ids: Record<'viewer' | 'reviewer' | 'editor' | 'owner', string>
  /** A snapshot of the matrix network, for routes that only read or comment on one. */
  snapshotId: string
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
  'GET /api/projects/:projectId/files': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/files` }) },
  'POST /api/projects/:projectId/files': { rule: 'editor', prepare: async f => ({ path: `/api/projects/${f.projectId}/files`, body: fileForm(`matrix-${crypto.randomUUID().slice(0, 8)}.s1p`, TOUCHSTONE_ONE_PORT) }) },
  'GET /api/projects/:projectId/files/:fileId': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/files/${await uploadedFile(f)}` }) },
  'GET /api/projects/:projectId/files/:fileId/data': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/files/${await uploadedFile(f)}/data` }) },
  'PUT /api/projects/:projectId/files/:fileId': { rule: 'editor', prepare: async f => ({ path: `/api/projects/${f.projectId}/files/${await uploadedFile(f)}`, body: fileForm('replacement.s1p', TOUCHSTONE_ONE_PORT) }) },
  'DELETE /api/projects/:projectId/files/:fileId': { rule: 'editor', prepare: async f => ({ path: `/api/projects/${f.projectId}/files/${await uploadedFile(f)}` }) },
  'GET /api/admin/outbox': { rule: 'admin', prepare: async () => ({ path: '/api/admin/outbox' }) },
  'GET /api/admin/outbox/:messageId': { rule: 'admin', prepare: async () => ({ path: `/api/admin/outbox/${(await outboxList())[0]!.id}` }) },
  'GET /api/invitations/:token': { rule: 'public', prepare: async f => ({ path: `/api/invitations/${(await invitation(f, f.projectId)).token}` }) },
  'POST /api/invitations/:token/accept': {
    rule: 'signed-in',
    // A throwaway project: an outsider who accepts must stay an outsider of the matrix project.
    prepare: async f => ({ path: `/api/invitations/${(await invitation(f, await throwawayProject(f))).token}/accept` }),
  },
  'GET /api/projects/:projectId/audit': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/audit` }) },
  'GET /api/projects/:projectId/invitations': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/invitations` }) },
  'POST /api/projects/:projectId/invitations': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/invitations`, body: { email: `inv-${crypto.randomUUID()}@test.example`, role: 'viewer' } }) },
  'DELETE /api/projects/:projectId/invitations/:invitationId': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/invitations/${(await invitation(f, f.projectId)).id}` }) },
  'GET /api/projects/:projectId/networks/:networkId/snapshots': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/networks/${f.networkId}/snapshots` }) },
  'POST /api/projects/:projectId/networks/:networkId/snapshots': { rule: 'editor', prepare: async f => ({ path: `/api/projects/${f.projectId}/networks/${f.networkId}/snapshots`, body: { title: 'Matrix snapshot' } }) },
  'GET /api/projects/:projectId/snapshots/:snapshotId': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/snapshots/${f.snapshotId}` }) },
  'GET /api/projects/:projectId/snapshots/:snapshotId/compare': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/snapshots/${f.snapshotId}/compare?with=live` }) },
  'POST /api/projects/:projectId/snapshots/:snapshotId/restore': {
    rule: 'editor',
    prepare: async (f) => {
      const current = await f.owner.get(`/api/projects/${f.projectId}/networks/${f.networkId}`)
      return { path: `/api/projects/${f.projectId}/snapshots/${f.snapshotId}/restore`, body: { revision: current.body.revision } }
    },
  },
  'GET /api/projects/:projectId/snapshots/:snapshotId/comments': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/snapshots/${f.snapshotId}/comments` }) },
  'POST /api/projects/:projectId/snapshots/:snapshotId/comments': { rule: 'reviewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/snapshots/${f.snapshotId}/comments`, body: { body: 'Matrix comment' } }) },
  'PATCH /api/projects/:projectId/comments/:commentId': {
    rule: 'reviewer',
    prepare: async (f, actor) => {
      // Only authors edit their words: an allowed actor edits its own comment.
      const author = actor === 'reviewer' || actor === 'editor' || actor === 'owner' ? f.clients[actor] : f.owner
      const made = await author.post(`/api/projects/${f.projectId}/snapshots/${f.snapshotId}/comments`, { body: 'To be edited' })
      return { path: `/api/projects/${f.projectId}/comments/${made.body.id}`, body: { body: 'Edited by the matrix' } }
    },
  },
  'GET /api/projects/:projectId/snapshots/:snapshotId/reviews': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/snapshots/${f.snapshotId}/reviews` }) },
  'POST /api/projects/:projectId/snapshots/:snapshotId/reviews': {
    rule: 'editor',
    prepare: async f => ({ path: `/api/projects/${f.projectId}/snapshots/${await freshSnapshot(f)}/reviews`, body: { reviewerIds: [f.ids.reviewer] } }),
  },
  'GET /api/projects/:projectId/reviews': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/reviews` }) },
  'POST /api/projects/:projectId/reviews/:reviewId/decision': {
    rule: 'reviewer',
    prepare: async (f, actor) => ({ path: `/api/projects/${f.projectId}/reviews/${await reviewFor(f, actor)}/decision`, body: { decision: 'clear' } }),
  },
  'POST /api/projects/:projectId/reviews/:reviewId/withdraw': {
    rule: 'editor',
    prepare: async f => ({ path: `/api/projects/${f.projectId}/reviews/${await reviewFor(f, 'reviewer')}/withdraw` }),
  },
  'DELETE /api/projects/:projectId/networks/:networkId': {
    rule: 'editor',
    prepare: async (f) => {
      const made = await f.owner.post(`/api/projects/${f.projectId}/networks`, { name: 'Doomed network' })
      return { path: `/api/projects/${f.projectId}/networks/${made.body.id}` }
    },
  },
}

// A one-port Touchstone 1.1 file of our own (a 25 Ω load in a 50 Ω system), for the file routes.
const TOUCHSTONE_ONE_PORT = '! Quillmere matrix load\n# GHZ S RI R 50\n1 -0.3333333333 0\n2 -0.3333333333 0\n'

/** A fresh file of the matrix project (each call its own, so deleting one leaves the others). */
async function uploadedFile(f: Fixture): Promise<string> {
  const answer = await f.owner.request('POST', `/api/projects/${f.projectId}/files`, fileForm(`fixture-${crypto.randomUUID().slice(0, 8)}.s1p`, TOUCHSTONE_ONE_PORT))
  return answer.body.id
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

/** A fresh snapshot of the matrix network (a snapshot takes one open review at a time). */
async function freshSnapshot(f: Fixture): Promise<string> {
  return (await f.owner.post(`/api/projects/${f.projectId}/networks/${f.networkId}/snapshots`, { title: 'Matrix review' })).body.id
}

/** A review awaiting decisions that `actor` was asked for when its role may decide; otherwise the reviewer's. */
async function reviewFor(f: Fixture, actor: Actor): Promise<string> {
  const decider = actor === 'reviewer' || actor === 'editor' || actor === 'owner' ? actor : 'reviewer'
  // Nobody reviews their own request, so the owner's review is requested by the editor.
  const requester = decider === 'owner' ? f.clients.editor : f.owner
  const made = await requester.post(`/api/projects/${f.projectId}/snapshots/${await freshSnapshot(f)}/reviews`, { reviewerIds: [f.ids[decider]] })
  return made.body.id
}

/** An invitation of a fresh address into `projectId`, with the token from its e-mail. */
async function invitation(f: Fixture, projectId: string): Promise<{ id: string; token: string }> {
  const email = `inv-${crypto.randomUUID()}@test.example`
  let id = ''
  const mail = await mailDuring([email], async () => { id = (await f.owner.post(`/api/projects/${projectId}/invitations`, { email, role: 'viewer' })).body.id })
  return { id, token: invitationToken(mail[0]!) }
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
  // Site-administrator routes answer 404 to everyone else, as a project does to outsiders.
  if (rule === 'admin') return actor === 'admin' ? 'allowed' : 404
  if (actor === 'outsider' || actor === 'admin') return 404
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
  const snapshot = await owner.client.post(`/api/projects/${projectId}/networks/${network.body.id}/snapshots`, { title: 'Matrix snapshot' })
  const admin = await signedIn('ada@quillmere.example', 'quillmere-demo-2026')
  fixture = {
    owner: owner.client,
    clients: { anonymous: new ApiClient(), outsider: others.outsider.client, admin, viewer: others.viewer.client, reviewer: others.reviewer.client, editor: others.editor.client, owner: owner.client },
    projectId,
    networkId: network.body.id,
    targetUserId: others.target.id,
    spare: { id: spare.id, email: spare.email },
    ids: { viewer: others.viewer.id, reviewer: others.reviewer.id, editor: others.editor.id, owner: owner.id },
    snapshotId: snapshot.body.id,
  }
  // The outbox rows need at least one message to open.
  await invitation(fixture, projectId)
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
