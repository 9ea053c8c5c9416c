import { readdirSync, readFileSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import { beforeAll, describe, expect, it } from 'vitest'
import { ApiClient, fileForm, newSignedInUser, signedIn, TEST_PASSWORD } from '../support/http'
import { invitationToken, mailDuring, outboxList, resetToken } from '../support/mail'

/**
 * Every API route × every kind of caller. The table is the access policy; the
 * test discovers the route files, so a new route without a row fails here, and a
 * route that forgets its check answers a refused caller with 2xx and fails too.
 */
// 'admin' is the demo site administrator, a member of no project; rule 'admin' is for site-administrator routes.
// 'token' is a script holding the owner's personal access token (editor ceiling, the matrix project) and no cookie.
// Bearer routes (/api/v1) take rule 'token' (any valid token) or 'token-viewer' (a token reaching the matrix
// project as viewer or more); there every actor but 'anonymous' calls with a token of its own instead of its cookie.
type Actor = 'anonymous' | 'outsider' | 'admin' | 'viewer' | 'reviewer' | 'editor' | 'owner' | 'token'
type Rule = 'public' | 'signed-in' | 'admin' | 'viewer' | 'reviewer' | 'editor' | 'owner' | 'token' | 'token-viewer'

const actors: Actor[] = ['anonymous', 'outsider', 'admin', 'viewer', 'reviewer', 'editor', 'owner', 'token']
const bearerRules = new Set<Rule>(['token', 'token-viewer'])
const rank: Record<string, number> = { viewer: 0, reviewer: 1, editor: 2, owner: 3 }

interface Fixture {
  clients: Record<Exclude<Actor, 'anonymous' | 'token'>, ApiClient> & { anonymous: ApiClient }
  /** Each signed-in actor's access token (members: the matrix project; outsider and admin: a project of their own). */
  tokens: Record<Exclude<Actor, 'anonymous'>, string>
  owner: ApiClient
  projectId: string
  networkId: string
  targetUserId: string
  spare: { id: string; email: string }
  /** User ids of the project members by role. */
  ids: Record<'viewer' | 'reviewer' | 'editor' | 'owner', string>
  /** A snapshot of the matrix network, for routes that only read or comment on one. */
  snapshotId: string
  /** An owner of projects outside the matrix, who invites the actors by their own addresses. */
  inviter: ApiClient
}

interface RouteCase {
  rule: Rule
  /** Makes whatever the call acts on and returns its path and body. */
  prepare: (f: Fixture, actor: Actor) => Promise<{ path: string; body?: unknown }>
}

/** One port on a matched load, solved at one frequency: the least a solve can be. */
const matchedLoad = { format: 'portwright.network', version: 1, name: 'Matched load', referenceImpedance: 50, sweep: { start: 1e9, stop: 1e9, points: 1 },
  blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'R', type: 'load', params: { resistance: 50 } }], wires: [['P1.1', 'R.1']] }
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
    // Only the invited address may accept: each actor gets an invitation of its own address, to a project of an
    // unrelated owner, so that an outsider who accepts stays an outsider of the matrix project.
    prepare: async (f, actor) => ({ path: `/api/invitations/${await invitationFor(f, actor)}/accept` }),
  },
  'GET /api/account/sessions': { rule: 'signed-in', prepare: async () => ({ path: '/api/account/sessions' }) },
  'DELETE /api/account/sessions/:sessionId': {
    rule: 'signed-in',
    // A second session of the same person is the one ended, so the shared client keeps its own.
    prepare: async (f, actor) => ({ path: `/api/account/sessions/${await secondSessionOf(f, actor)}` }),
  },
  'POST /api/account/password': {
    rule: 'signed-in',
    // Runs as a fresh bystander (see sessionFor): a password change ends the person's other sessions.
    prepare: async () => ({ path: '/api/account/password', body: { currentPassword: TEST_PASSWORD, newPassword: TEST_PASSWORD } }),
  },
  'POST /api/auth/password-reset': { rule: 'public', prepare: async () => ({ path: '/api/auth/password-reset', body: { email: `m-${crypto.randomUUID()}@test.example` } }) },
  'POST /api/auth/password-reset/confirm': {
    rule: 'public',
    prepare: async () => {
      const person = await newSignedInUser('Matrix forgetful')
      const mail = await mailDuring([person.email], () => new ApiClient().post('/api/auth/password-reset', { email: person.email }), 1)
      return { path: '/api/auth/password-reset/confirm', body: { token: resetToken(mail[0]!), password: TEST_PASSWORD } }
    },
  },
  'GET /api/projects/:projectId/audit': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/audit` }) },
  'GET /api/projects/:projectId/invitations': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/invitations` }) },
  'POST /api/projects/:projectId/invitations': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/invitations`, body: { email: `inv-${crypto.randomUUID()}@test.example`, role: 'viewer' } }) },
  'DELETE /api/projects/:projectId/invitations/:invitationId': { rule: 'owner', prepare: async f => ({ path: `/api/projects/${f.projectId}/invitations/${(await invitation(f, f.projectId)).id}` }) },
  'GET /api/projects/:projectId/networks/:networkId/snapshots': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/networks/${f.networkId}/snapshots` }) },
  'POST /api/projects/:projectId/networks/:networkId/snapshots': { rule: 'editor', prepare: async f => ({ path: `/api/projects/${f.projectId}/networks/${f.networkId}/snapshots`, body: { title: 'Matrix snapshot' } }) },
  'GET /api/projects/:projectId/snapshots/:snapshotId': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/snapshots/${f.snapshotId}` }) },
  'GET /api/projects/:projectId/snapshots/:snapshotId/compare': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/snapshots/${f.snapshotId}/compare?with=live` }) },
  'GET /api/projects/:projectId/snapshots/:snapshotId/data': { rule: 'viewer', prepare: async f => ({ path: await frozenDataPath(f) }) },
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
  'GET /api/account/tokens': { rule: 'signed-in', prepare: async () => ({ path: '/api/account/tokens' }) },
  'POST /api/account/tokens': {
    rule: 'signed-in',
    // A token reaches only the maker's projects: each actor names one of its own.
    prepare: async (f, actor) => ({ path: '/api/account/tokens', body: { name: 'Matrix token', projects: [await projectOf(f, actor)], roleCeiling: 'viewer', expiresInDays: 1 } }),
  },
  'DELETE /api/account/tokens/:tokenId': {
    rule: 'signed-in',
    prepare: async (f, actor) => {
      const maker = actor === 'anonymous' || actor === 'token' ? f.owner : f.clients[actor]
      const made = await maker.post('/api/account/tokens', { name: 'Doomed token', projects: [await projectOf(f, actor)], roleCeiling: 'viewer', expiresInDays: 1 })
      return { path: `/api/account/tokens/${made.body.id}` }
    },
  },
  'GET /api/v1/openapi.json': { rule: 'public', prepare: async () => ({ path: '/api/v1/openapi.json' }) },
  'GET /api/v1/token': { rule: 'token', prepare: async () => ({ path: '/api/v1/token' }) },
  'GET /api/v1/networks': { rule: 'token-viewer', prepare: async f => ({ path: `/api/v1/networks?project=${f.projectId}` }) },
  'POST /api/v1/solve': { rule: 'token-viewer', prepare: async f => ({ path: '/api/v1/solve', body: { project: f.projectId, document: matchedLoad } }) },
  'GET /api/reviews/waiting': { rule: 'signed-in', prepare: async () => ({ path: '/api/reviews/waiting' }) },
  'GET /api/projects/:projectId/networks/:networkId/checkpoints': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/networks/${f.networkId}/checkpoints` }) },
  'GET /api/projects/:projectId/networks/:networkId/checkpoints/:checkpointId': {
    rule: 'viewer',
    prepare: async f => ({ path: `/api/projects/${f.projectId}/networks/${f.networkId}/checkpoints/${await newestCheckpoint(f)}` }),
  },
  'POST /api/projects/:projectId/networks/:networkId/checkpoints/:checkpointId/restore': {
    rule: 'editor',
    prepare: async (f) => {
      const checkpointId = await newestCheckpoint(f)
      const current = await f.owner.get(`/api/projects/${f.projectId}/networks/${f.networkId}`)
      return { path: `/api/projects/${f.projectId}/networks/${f.networkId}/checkpoints/${checkpointId}/restore`, body: { revision: current.body.revision } }
    },
  },
  'GET /api/projects/:projectId/networks/:networkId/jobs': { rule: 'viewer', prepare: async f => ({ path: `${await jobsNetwork(f)}/jobs` }) },
  'POST /api/projects/:projectId/networks/:networkId/jobs': {
    rule: 'editor',
    prepare: async (f) => {
      const base = await jobsNetwork(f)
      await cancelUnfinishedJobs(f, base)
      return { path: `${base}/jobs`, body: { kind: 'tolerance', trials: 10, seed: 1 } }
    },
  },
  // The event stream stays open `seconds` (here 1) and then ends, so the call returns.
  'GET /api/projects/:projectId/networks/:networkId/jobs/events': { rule: 'viewer', prepare: async f => ({ path: `${await jobsNetwork(f)}/jobs/events?seconds=1` }) },
  'GET /api/projects/:projectId/networks/:networkId/jobs/:jobId': { rule: 'viewer', prepare: async f => ({ path: `${await jobsNetwork(f)}/jobs/${await ownerJob(f)}` }) },
  'POST /api/projects/:projectId/networks/:networkId/jobs/:jobId/cancel': { rule: 'editor', prepare: async f => ({ path: `${await jobsNetwork(f)}/jobs/${await ownerJob(f)}/cancel` }) },
  'GET /api/projects/:projectId/substrates': { rule: 'viewer', prepare: async f => ({ path: `/api/projects/${f.projectId}/substrates` }) },
  'POST /api/projects/:projectId/substrates': {
    rule: 'editor',
    prepare: async f => ({ path: `/api/projects/${f.projectId}/substrates`, body: { name: `Matrix board ${crypto.randomUUID().slice(0, 8)}`, permittivity: 3.5, height: 5.08e-4 } }),
  },
  'PATCH /api/projects/:projectId/substrates/:substrateId': {
    rule: 'editor',
    prepare: async f => ({ path: `/api/projects/${f.projectId}/substrates/${await librarySubstrate(f)}`, body: { note: 'changed by the matrix' } }),
  },
  'DELETE /api/projects/:projectId/substrates/:substrateId': {
    rule: 'editor',
    prepare: async f => ({ path: `/api/projects/${f.projectId}/substrates/${await librarySubstrate(f)}` }),
  },
  'DELETE /api/projects/:projectId/networks/:networkId': {
    rule: 'editor',
    prepare: async (f) => {
      const made = await f.owner.post(`/api/projects/${f.projectId}/networks`, { name: 'Doomed network' })
      return { path: `/api/projects/${f.projectId}/networks/${made.body.id}` }
    },
  },
}

/** A project the actor is a member of: the matrix project for members, one of their own for the others. */
const ownProjects = new Map<Actor, string>()
async function projectOf(f: Fixture, actor: Actor): Promise<string> {
  if (actor === 'viewer' || actor === 'reviewer' || actor === 'editor' || actor === 'owner' || actor === 'anonymous' || actor === 'token') return f.projectId
  if (!ownProjects.has(actor)) ownProjects.set(actor, (await f.clients[actor].post('/api/projects', { name: `Own project of ${actor}` })).body.id)
  return ownProjects.get(actor)!
}

// A one-port Touchstone 1.1 file of our own (a 25 Ω load in a 50 Ω system), for the file routes.
const TOUCHSTONE_ONE_PORT = '! Quillmere matrix load\n# GHZ S RI R 50\n1 -0.3333333333 0\n2 -0.3333333333 0\n'

/** A fresh file of the matrix project (each call its own, so deleting one leaves the others). */
async function uploadedFile(f: Fixture): Promise<string> {
  const answer = await f.owner.request('POST', `/api/projects/${f.projectId}/files`, fileForm(`fixture-${crypto.randomUUID().slice(0, 8)}.s1p`, TOUCHSTONE_ONE_PORT))
  return answer.body.id
}

let frozenData: string | undefined

/** The data route of a snapshot that froze a data file (made once: a network with a data block on a fresh upload). */
async function frozenDataPath(f: Fixture): Promise<string> {
  if (frozenData) return frozenData
  const name = `frozen-${crypto.randomUUID().slice(0, 8)}.s1p`
  await f.owner.request('POST', `/api/projects/${f.projectId}/files`, fileForm(name, TOUCHSTONE_ONE_PORT))
  const document = {
    format: 'portwright.network', version: 1.1, name: 'Matrix data network', referenceImpedance: 50, variables: {},
    sweep: { start: '1 GHz', stop: '2 GHz', points: 3, spacing: 'linear' },
    blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'DA1', type: 'data', params: { file: name } }],
    wires: [['P1.1', 'DA1.1']],
  }
  const network = await f.owner.post(`/api/projects/${f.projectId}/networks`, { name: 'Matrix data network', document })
  expect(network.status, JSON.stringify(network.body)).toBe(201)
  const snapshot = await f.owner.post(`/api/projects/${f.projectId}/networks/${network.body.id}/snapshots`, { title: 'Matrix frozen data' })
  expect(snapshot.status, JSON.stringify(snapshot.body)).toBe(201)
  return frozenData = `/api/projects/${f.projectId}/snapshots/${snapshot.body.id}/data?file=${encodeURIComponent(name)}`
}

/** A fresh board in the matrix project's substrate library (each call its own). */
async function librarySubstrate(f: Fixture): Promise<string> {
  return (await f.owner.post(`/api/projects/${f.projectId}/substrates`, { name: `Fixture board ${crypto.randomUUID().slice(0, 8)}`, permittivity: 2.2, height: 1.27e-3 })).body.id
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

let jobsNetworkPath: string | undefined

/** A network of the matrix project with a spec, tunables and tolerances, which the queue accepts runs of. */
async function jobsNetwork(f: Fixture): Promise<string> {
  if (jobsNetworkPath) return jobsNetworkPath
  const document = JSON.parse(readFileSync(join(process.cwd(), 'shared/examples/branch-line-tolerances.json'), 'utf8'))
  const made = await f.owner.post(`/api/projects/${f.projectId}/networks`, { name: 'Matrix queue network', document })
  expect(made.status, JSON.stringify(made.body)).toBe(201)
  return jobsNetworkPath = `/api/projects/${f.projectId}/networks/${made.body.id}`
}

/** Cancels the network's waiting runs, so the project's limit on unfinished runs never answers instead of the gate. */
async function cancelUnfinishedJobs(f: Fixture, base: string): Promise<void> {
  const list = await f.owner.get(`${base}/jobs`)
  for (const job of list.body as Array<{ id: string; state: string }>) {
    if (job.state === 'queued' || job.state === 'running') await f.owner.post(`${base}/jobs/${job.id}/cancel`, {})
  }
}

/** A fresh run sent by the owner (no worker runs in this file, so it waits in the queue). */
async function ownerJob(f: Fixture): Promise<string> {
  const base = await jobsNetwork(f)
  await cancelUnfinishedJobs(f, base)
  const sent = await f.owner.post(`${base}/jobs`, { kind: 'tolerance', trials: 10, seed: 1 })
  expect(sent.status, JSON.stringify(sent.body)).toBe(201)
  return sent.body.id
}

/** The matrix network's newest history checkpoint, after a save by the owner makes sure there is one. */
async function newestCheckpoint(f: Fixture): Promise<string> {
  const current = await f.owner.get(`/api/projects/${f.projectId}/networks/${f.networkId}`)
  await f.owner.put(`/api/projects/${f.projectId}/networks/${f.networkId}`, { revision: current.body.revision, document: current.body.document })
  return (await f.owner.get(`/api/projects/${f.projectId}/networks/${f.networkId}/checkpoints`)).body[0].id
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

/** The e-mail of an actor's account (none for the anonymous caller and the token actor). */
async function emailOf(f: Fixture, actor: Actor): Promise<string | null> {
  // The token actor calls with a token and no cookie: it has no session of its own to look up.
  return actor === 'anonymous' || actor === 'token' ? null : (await f.clients[actor].get('/api/auth/me')).body.email
}

/** A token inviting the actor's own address (a fresh one for the anonymous caller) to a fresh project of another owner. */
async function invitationFor(f: Fixture, actor: Actor): Promise<string> {
  const email = await emailOf(f, actor) ?? `inv-${crypto.randomUUID()}@test.example`
  const inviter = f.inviter
  const projectId = (await inviter.post('/api/projects', { name: 'Invitation matrix' })).body.id
  const mail = await mailDuring([email], () => inviter.post(`/api/projects/${projectId}/invitations`, { email, role: 'viewer' }))
  return invitationToken(mail[0]!)
}

/** Signs the actor in a second time and returns that session's id (any id for the anonymous caller). */
async function secondSessionOf(f: Fixture, actor: Actor): Promise<string> {
  const email = await emailOf(f, actor)
  if (!email) return crypto.randomUUID()
  const second = await signedIn(email, actor === 'admin' ? 'quillmere-demo-2026' : TEST_PASSWORD)
  const sessions = (await second.get('/api/account/sessions')).body as Array<{ id: string, current: boolean }>
  return sessions.find(s => s.current)!.id
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
  // A token works on bearer routes alone; sessions never reach them (tested below).
  if (bearerRules.has(rule)) return rule === 'token' || !(actor === 'outsider' || actor === 'admin') ? 'allowed' : 404
  if (actor === 'token') return 401
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
  const inviter = await newSignedInUser('Matrix inviter')
  fixture = {
    owner: owner.client,
    clients: { anonymous: new ApiClient(), outsider: others.outsider.client, admin, viewer: others.viewer.client, reviewer: others.reviewer.client, editor: others.editor.client, owner: owner.client },
    projectId,
    networkId: network.body.id,
    targetUserId: others.target.id,
    spare: { id: spare.id, email: spare.email },
    ids: { viewer: others.viewer.id, reviewer: others.reviewer.id, editor: others.editor.id, owner: owner.id },
    snapshotId: snapshot.body.id,
    inviter: inviter.client,
    tokens: {} as Fixture['tokens'],
  }
  for (const actor of ['outsider', 'admin', 'viewer', 'reviewer', 'editor', 'owner'] as const) {
    const made = await fixture.clients[actor].post('/api/account/tokens', { name: `Matrix ${actor}`, projects: [await projectOf(fixture, actor)], roleCeiling: 'editor', expiresInDays: 1 })
    fixture.tokens[actor] = made.body.token
  }
  fixture.tokens.token = fixture.tokens.owner
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
        // Scripts (bearer routes, and the token actor everywhere) send a token and no cookie; the others their session.
        const script = actor !== 'anonymous' && (actor === 'token' || bearerRules.has(spec.rule))
        // Session-ending routes get a fresh session of the same person, so later cases keep theirs.
        const client = actor === 'anonymous' || script ? new ApiClient() : await sessionFor(actor as Exclude<Actor, 'anonymous' | 'token'>, route)
        const headers: Record<string, string> = script ? { authorization: `Bearer ${fixture.tokens[actor]}` } : {}
        const answer = await client.request(method, path, body ?? (method === 'GET' ? undefined : {}), headers)
        if (expected === 'allowed') expect(answer.status, JSON.stringify(answer.body)).toBeLessThan(300)
        else expect(answer.status, JSON.stringify(answer.body)).toBe(expected)
      })
    }
  }
})

describe('bearer routes refuse sessions', () => {
  for (const [route, spec] of Object.entries(policy).filter(([, s]) => bearerRules.has(s.rule))) {
    it(`${route} with the owner's session cookie and no token → 401`, async () => {
      const { path, body } = await spec.prepare(fixture, 'owner')
      const method = route.split(' ')[0]!
      const answer = await fixture.owner.request(method, path, body ?? (method === 'GET' ? undefined : {}))
      expect(answer.status, JSON.stringify(answer.body)).toBe(401)
    })
  }
})

async function sessionFor(actor: Exclude<Actor, 'anonymous' | 'token'>, route: string): Promise<ApiClient> {
  // Routes that start or end a session would replace or revoke the shared clients' cookies.
  const touchesSession = /\/auth\/(signin|signup|signout|signout-everywhere)$|\/account\/password$/.test(route)
  return touchesSession ? (await newSignedInUser('Matrix bystander')).client : fixture.clients[actor]
}
