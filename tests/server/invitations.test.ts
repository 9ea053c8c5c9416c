import pg from 'pg'
import { beforeAll, describe, expect, it } from 'vitest'
import { randomUUID } from 'node:crypto'
import { ApiClient, newSignedInUser, TEST_PASSWORD } from '../support/http'
import { invitationToken, mailDuring } from '../support/mail'

let owner: Awaited<ReturnType<typeof newSignedInUser>>
let projectId: string

async function sql(text: string, values: unknown[]) {
  const client = new pg.Client({ connectionString: process.env.PORTWRIGHT_TEST_DATABASE_URL })
  await client.connect()
  try { return await client.query(text, values) } finally { await client.end() }
}

/** Invites a fresh address and returns it with the token from the e-mail it got. */
async function invite(role: string) {
  const email = `invitee-${randomUUID()}@test.example`
  let answer: Awaited<ReturnType<ApiClient['post']>> | undefined
  const mail = await mailDuring([email], async () => { answer = await owner.client.post(`/api/projects/${projectId}/invitations`, { email, role }) })
  expect(answer!.status, JSON.stringify(answer!.body)).toBe(201)
  expect(mail).toHaveLength(1)
  return { email, token: invitationToken(mail[0]!), id: answer!.body.id as string, mail: mail[0]! }
}

beforeAll(async () => {
  owner = await newSignedInUser('Invitation Owner')
  projectId = (await owner.client.post('/api/projects', { name: 'Invited bench' })).body.id
})

describe('invitations', () => {
  it('mail exactly the invited address, with a link and the role, and store only a hash of the token', async () => {
    const { email, token, mail } = await invite('reviewer')
    expect(mail.to).toEqual([email])
    expect(mail.subject).toBe('Join “Invited bench” on Portwright')
    expect(mail.text).toContain('Invitation Owner would like you to join the project “Invited bench” on Portwright as reviewer.')
    expect(mail.html).toContain(`/invitations/${token}`)
    const stored = await sql('SELECT token_hash FROM invitations WHERE email = $1', [email])
    expect(stored.rows).toHaveLength(1)
    expect(stored.rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/)
    expect(stored.rows[0].token_hash).not.toContain(token)
  })

  it('a new account signs up and joins with the invited role; the link then refuses a second use', async () => {
    const { email, token } = await invite('editor')
    const preview = await new ApiClient().get(`/api/invitations/${token}`)
    expect(preview.body).toMatchObject({ projectName: 'Invited bench', email, role: 'editor', status: 'pending', invitedByName: 'Invitation Owner' })

    const newcomer = new ApiClient()
    expect((await newcomer.post('/api/auth/signup', { email, name: 'Newcomer', password: TEST_PASSWORD })).status).toBe(201)
    const accepted = await newcomer.post(`/api/invitations/${token}/accept`)
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(200)
    expect(accepted.body).toEqual({ projectId, role: 'editor', alreadyMember: false })
    expect((await newcomer.get(`/api/projects/${projectId}`)).body.role).toBe('editor')

    const other = await newSignedInUser('Second taker')
    const again = await other.client.post(`/api/invitations/${token}/accept`)
    expect(again.status).toBe(410)
    expect(again.body.message).toMatch(/already been used/)
    expect((await other.client.get(`/api/projects/${projectId}`)).status).toBe(404)
    expect((await new ApiClient().get(`/api/invitations/${token}`)).body.status).toBe('accepted')
  })

  it('two accepts racing for one link: exactly one joins', async () => {
    const { email, token } = await invite('viewer')
    const first = new ApiClient()
    expect((await first.post('/api/auth/signup', { email, name: 'Racer', password: TEST_PASSWORD })).status).toBe(201)
    const second = new ApiClient()
    expect((await second.post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
    const answers = await Promise.all([first.post(`/api/invitations/${token}/accept`), second.post(`/api/invitations/${token}/accept`)])
    expect(answers.map(x => x.status).sort()).toEqual([200, 410])
  })

  it('attack: an invitation accepted by the wrong account is refused, naming the address partly hidden', async () => {
    const { email, token } = await invite('editor')
    const wrong = await newSignedInUser('Link finder')
    const answer = await wrong.client.post(`/api/invitations/${token}/accept`)
    expect(answer.status).toBe(403)
    const masked = `i•••${email.split('@')[0]!.slice(-1)}@test.example`
    expect(answer.body.message).toContain(`This invitation is for ${masked}, and you are signed in as ${wrong.email}.`)
    expect(answer.body.message).toMatch(/Sign out, then open the link again/)
    expect(answer.body.message).not.toContain(email)
    expect((await wrong.client.get(`/api/projects/${projectId}`)).status).toBe(404)
    // The link still works for the invited address, whatever the case it is typed in.
    expect((await new ApiClient().get(`/api/invitations/${token}`)).body.status).toBe('pending')
    const right = new ApiClient()
    expect((await right.post('/api/auth/signup', { email: email.toUpperCase(), name: 'Rightful', password: TEST_PASSWORD })).status).toBe(201)
    expect((await right.post(`/api/invitations/${token}/accept`)).status).toBe(200)
  })

  it('an expired link is refused clearly and joins nobody', async () => {
    const { token, id } = await invite('reviewer')
    await sql(`UPDATE invitations SET expires_at = now() - interval '1 minute' WHERE id = $1`, [id])
    const late = await newSignedInUser('Late comer')
    const answer = await late.client.post(`/api/invitations/${token}/accept`)
    expect(answer.status).toBe(410)
    expect(answer.body.message).toMatch(/expired on/)
    expect((await late.client.get(`/api/projects/${projectId}`)).status).toBe(404)
    expect((await new ApiClient().get(`/api/invitations/${token}`)).body.status).toBe('expired')
  })

  it('attack: a forged host header does not put another site into the mailed link', async () => {
    const email = `forged-${randomUUID()}@test.example`
    // No Origin header, so the same-site check lets the request through to the mail it sends.
    const forger = new ApiClient({ origin: null })
    forger.cookie = owner.client.cookie
    const mail = await mailDuring([email], () => forger.request('POST', `/api/projects/${projectId}/invitations`, { email, role: 'viewer' }, { 'x-forwarded-host': 'evil.example', 'x-forwarded-proto': 'https' }))
    expect(mail).toHaveLength(1)
    expect(mail[0]!.text).not.toContain('evil.example')
    expect(mail[0]!.text).toContain(`http://127.0.0.1:${process.env.PORTWRIGHT_TEST_PORT}/invitations/`)
  })

  it('expire seven days after sending', async () => {
    const { id } = await invite('viewer')
    const row = (await sql('SELECT expires_at - created_at AS life FROM invitations WHERE id = $1', [id])).rows[0]
    expect(row.life.days).toBe(7)
  })

  it('a withdrawn link is refused; re-inviting the same address withdraws the older link', async () => {
    const first = await invite('viewer')
    const withdrawn = await owner.client.delete(`/api/projects/${projectId}/invitations/${first.id}`)
    expect(withdrawn.body.status).toBe('revoked')
    const someone = await newSignedInUser('Too late')
    expect((await someone.client.post(`/api/invitations/${first.token}/accept`)).body.message).toMatch(/withdrawn/)

    const email = `again-${randomUUID()}@test.example`
    const mails: string[] = []
    for (let i = 0; i < 2; i++) {
      const mail = await mailDuring([email], () => owner.client.post(`/api/projects/${projectId}/invitations`, { email, role: 'viewer' }))
      mails.push(invitationToken(mail[0]!))
    }
    const taker = new ApiClient()
    expect((await taker.post('/api/auth/signup', { email, name: 'Taker', password: TEST_PASSWORD })).status).toBe(201)
    expect((await taker.post(`/api/invitations/${mails[0]}/accept`)).status).toBe(410)
    expect((await taker.post(`/api/invitations/${mails[1]}/accept`)).status).toBe(200)
  })

  it('an unknown or malformed token is not found; a member is not invited twice', async () => {
    expect((await new ApiClient().get(`/api/invitations/${'A'.repeat(43)}`)).status).toBe(404)
    expect((await new ApiClient().get('/api/invitations/short')).status).toBe(404)
    const member = await newSignedInUser('Already in')
    await owner.client.post(`/api/projects/${projectId}/members`, { email: member.email, role: 'viewer' })
    const answer = await owner.client.post(`/api/projects/${projectId}/invitations`, { email: member.email, role: 'editor' })
    expect(answer.status).toBe(409)
  })

  it('are listed for owners and recorded in the audit trail', async () => {
    const { email } = await invite('reviewer')
    const list = await owner.client.get(`/api/projects/${projectId}/invitations`)
    expect(list.body.find((i: { email: string }) => i.email === email)).toMatchObject({ role: 'reviewer', status: 'pending' })
    const audit = await owner.client.get(`/api/projects/${projectId}/audit`)
    const actions = audit.body.map((e: { action: string }) => e.action)
    expect(actions).toContain('invitation.sent')
    expect(actions).toContain('invitation.accepted')
    expect(actions).toContain('invitation.revoked')
  })
})
