import { randomUUID } from 'node:crypto'
import pg from 'pg'
import { sealSession } from 'h3'
import { afterAll, describe, expect, it } from 'vitest'
import { appUrl } from '../support/app'
import { ApiClient, newSignedInUser, TEST_PASSWORD } from '../support/http'
import { liveClient, liveServerUrl, synced, until, upgradeStatus, type LiveClient } from '../support/live'
import { mailDuring, resetToken } from '../support/mail'

async function sql(text: string, values: unknown[] = []) {
  const client = new pg.Client({ connectionString: process.env.PORTWRIGHT_TEST_DATABASE_URL })
  await client.connect()
  try { return await client.query(text, values) } finally { await client.end() }
}

/** The same cookie in a second client: what someone who copied it (a shared computer, malware) would hold. */
function copyOf(client: ApiClient): ApiClient {
  const thief = new ApiClient()
  thief.cookie = client.cookie
  return thief
}

const liveClients: LiveClient[] = []
afterAll(() => { for (const c of liveClients) c.destroy() })

describe('sign-up rules', () => {
  it('refuses a password shorter than 12 characters, naming the field', async () => {
    const answer = await new ApiClient().post('/api/auth/signup', { email: `short-${crypto.randomUUID()}@test.example`, name: 'Short', password: 'elevenchars' })
    expect(answer.status).toBe(400)
    expect(answer.body.data.fields.password).toMatch(/at least 12 characters/)
  })

  it('refuses a malformed e-mail address', async () => {
    const answer = await new ApiClient().post('/api/auth/signup', { email: 'not-an-address', name: 'X', password: 'long-enough-password' })
    expect(answer.status).toBe(400)
    expect(answer.body.data.fields.email).toMatch(/e-mail/i)
  })

  it('refuses a second account with the same e-mail', async () => {
    const { email } = await newSignedInUser()
    const answer = await new ApiClient().post('/api/auth/signup', { email, name: 'Twin', password: TEST_PASSWORD })
    expect(answer.status).toBe(409)
  })
})

describe('sign-in', () => {
  it('signs in with the right password and reports who is signed in', async () => {
    const { email } = await newSignedInUser('Right Password')
    const client = new ApiClient()
    expect((await client.post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
    const me = await client.get('/api/auth/me')
    expect(me.body).toMatchObject({ email, name: 'Right Password', isAdmin: false })
  })

  it('answers a wrong password and an unknown account with the same message', async () => {
    const { email } = await newSignedInUser()
    const wrong = await new ApiClient().post('/api/auth/signin', { email, password: 'definitely-not-it' })
    const unknown = await new ApiClient().post('/api/auth/signin', { email: `nobody-${crypto.randomUUID()}@test.example`, password: 'definitely-not-it' })
    expect(wrong.status).toBe(401)
    expect(unknown.status).toBe(401)
    expect(wrong.body.message).toBe(unknown.body.message)
  })

  it('sets an httpOnly, sameSite=lax session cookie', async () => {
    const { email } = await newSignedInUser()
    const response = await fetch(`${process.env.PORTWRIGHT_TEST_URL}/api/auth/signin`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-forwarded-for': '10.200.0.1' },
      body: JSON.stringify({ email, password: TEST_PASSWORD }),
    })
    const cookie = response.headers.getSetCookie().join('\n')
    expect(cookie).toMatch(/HttpOnly/i)
    expect(cookie).toMatch(/SameSite=Lax/i)
  })
})

describe('sign-in limits', () => {
  it('attack: guessing from one address locks that address out of the account, not its owner elsewhere', async () => {
    const { email } = await newSignedInUser()
    const attacker = new ApiClient()
    for (let i = 0; i < 5; i++) {
      expect((await attacker.post('/api/auth/signin', { email, password: 'wrong-password-here' })).status).toBe(401)
    }
    const locked = await attacker.post('/api/auth/signin', { email, password: TEST_PASSWORD })
    expect(locked.status).toBe(429)
    expect(locked.body.message).toMatch(/Too many failed sign-in attempts/)
    // The owner, signing in from their own address, is not locked out by the stranger.
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
  })

  it('attack: 20 parallel wrong passwords are each counted before any is checked', async () => {
    const { email } = await newSignedInUser()
    const attacker = new ApiClient()
    const answers = await Promise.all(Array.from({ length: 20 }, () => attacker.post('/api/auth/signin', { email, password: 'parallel-guess-123' })))
    const statuses = answers.map(a => a.status)
    // At most the pair's 5 points reach the password check; every other guess is refused unread.
    expect(statuses.filter(s => s === 401).length).toBeLessThanOrEqual(5)
    expect(statuses.filter(s => s === 429).length).toBeGreaterThanOrEqual(15)
  })

  it('attack: guesses spread over many addresses meet the account-wide ceiling', async () => {
    const { email } = await newSignedInUser()
    for (let i = 0; i < 50; i++) await new ApiClient().post('/api/auth/signin', { email, password: 'spread-guess-1234' })
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(429)
  })

  it('attack: a forged X-Forwarded-For entry on the left does not change the counted address', async () => {
    const { email } = await newSignedInUser()
    const address = '10.251.1.1'
    for (let i = 0; i < 5; i++) {
      // The client writes a fresh fake address each time; the proxy's own entry (rightmost) stays the same.
      await new ApiClient({ address: `192.0.2.${i}, ${address}` }).post('/api/auth/signin', { email, password: 'wrong-password-here' })
    }
    expect((await new ApiClient({ address: `198.51.100.7, ${address}` }).post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(429)
  })

  it('limits one address trying many accounts', async () => {
    const address = `10.250.${Math.floor(Math.random() * 250)}.9`
    let last = 0
    for (let i = 0; i < 31; i++) {
      last = (await new ApiClient({ address }).post('/api/auth/signin', { email: `spray-${i}-${crypto.randomUUID()}@test.example`, password: 'guess-password' })).status
    }
    expect(last).toBe(429)
    // Another address is not affected.
    const { email } = await newSignedInUser()
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
  })
})

describe('sign-up limits', () => {
  it('attack: one address creating accounts in bulk', async () => {
    const address = `10.252.${Math.floor(Math.random() * 250)}.3`
    const statuses: number[] = []
    for (let i = 0; i < 11; i++) {
      statuses.push((await new ApiClient({ address }).post('/api/auth/signup', { email: `bulk-${i}-${crypto.randomUUID()}@test.example`, name: 'Bulk', password: 'bulk-password-1234' })).status)
    }
    expect(statuses.slice(0, 10).every(s => s === 201)).toBe(true)
    expect(statuses[10]).toBe(429)
  })
})

describe('session revocation', () => {
  it('"sign out everywhere" ends every session of that user', async () => {
    const { email } = await newSignedInUser()
    const laptop = new ApiClient()
    const desk = new ApiClient()
    await laptop.post('/api/auth/signin', { email, password: TEST_PASSWORD })
    await desk.post('/api/auth/signin', { email, password: TEST_PASSWORD })
    expect((await desk.get('/api/auth/me')).status).toBe(200)
    expect((await laptop.post('/api/auth/signout-everywhere')).status).toBe(200)
    expect((await desk.get('/api/auth/me')).status).toBe(401)
    expect((await desk.get('/api/projects')).status).toBe(401)
    // Signing in again works and gives a fresh, valid session.
    await desk.post('/api/auth/signin', { email, password: TEST_PASSWORD })
    expect((await desk.get('/api/auth/me')).status).toBe(200)
  })

  it('sign out ends this session only', async () => {
    const { client } = await newSignedInUser()
    expect((await client.post('/api/auth/signout')).status).toBe(200)
    expect((await client.get('/api/auth/me')).status).toBe(401)
  })
})

describe('same-site Origin check', () => {
  it('refuses a state-changing request from a foreign Origin', async () => {
    const { client } = await newSignedInUser()
    client.origin = 'https://elsewhere.example'
    const answer = await client.post('/api/projects', { name: 'Cross-site attempt' })
    expect(answer.status).toBe(403)
    expect(answer.body.message).toMatch(/origin/i)
  })

  it('refuses a request a browser marks as cross-site', async () => {
    const { client } = await newSignedInUser()
    client.origin = null
    const answer = await client.request('POST', '/api/projects', { name: 'Cross-site attempt' }, { 'sec-fetch-site': 'cross-site' })
    expect(answer.status).toBe(403)
  })

  it('accepts the same request from the app\'s own Origin', async () => {
    const { client } = await newSignedInUser()
    expect((await client.post('/api/projects', { name: 'Same-site' })).status).toBe(201)
  })
})

describe('server-side sessions', () => {
  it('attack: a cookie copied before sign-out is refused after it, on the API and the websocket', async () => {
    const { client } = await newSignedInUser('Signs out')
    const project = (await client.post('/api/projects', { name: 'Stolen cookie bench' })).body.id
    const network = (await client.post(`/api/projects/${project}/networks`, { name: 'Stolen cookie network' })).body.id
    const stolen = copyOf(client)
    expect((await stolen.get('/api/auth/me')).status).toBe(200)
    expect((await client.post('/api/auth/signout')).status).toBe(200)
    expect((await stolen.get('/api/auth/me')).status).toBe(401)
    expect((await stolen.get(`/api/projects/${project}`)).status).toBe(401)
    expect(await upgradeStatus(`${liveServerUrl(appUrl())}/${network}`, { origin: appUrl(), cookie: stolen.cookie })).toBe(401)
  })

  it('attack: a cookie copied before the session-clearing call of the page itself is refused after it', async () => {
    const { client } = await newSignedInUser()
    const stolen = copyOf(client)
    expect((await client.request('DELETE', '/api/_auth/session')).status).toBeLessThan(300)
    expect((await stolen.get('/api/auth/me')).status).toBe(401)
  })

  it('attack: a session revoked from the account page is refused on the websocket upgrade, and an open connection is closed', async () => {
    const { client } = await newSignedInUser('Revokes a laptop')
    const project = (await client.post('/api/projects', { name: 'Revoked live bench' })).body.id
    const network = (await client.post(`/api/projects/${project}/networks`, { name: 'Revoked live network' })).body.id
    const laptop = new ApiClient()
    const me = (await client.get('/api/auth/me')).body
    expect((await laptop.post('/api/auth/signin', { email: me.email, password: TEST_PASSWORD })).status).toBe(200)
    const live = liveClient(appUrl(), network, laptop.cookie)
    liveClients.push(live)
    await synced(live)
    const sessions = (await client.get('/api/account/sessions')).body as Array<{ id: string, current: boolean }>
    expect(sessions).toHaveLength(2)
    const other = sessions.find(s => !s.current)!
    expect((await client.delete(`/api/account/sessions/${other.id}`)).body).toEqual({ revoked: true, current: false })
    await until('the revoked session\'s connection to close', () => live.closes.some(c => c.code === 4401))
    expect(await upgradeStatus(`${liveServerUrl(appUrl())}/${network}`, { origin: appUrl(), cookie: laptop.cookie })).toBe(401)
    expect((await laptop.get('/api/auth/me')).status).toBe(401)
    expect((await client.get('/api/auth/me')).status).toBe(200)
  })

  it('list the account\'s live sessions with device, times and "this one"; another account\'s session is not found', async () => {
    const { client, email } = await newSignedInUser()
    const phone = new ApiClient()
    await phone.request('POST', '/api/auth/signin', { email, password: TEST_PASSWORD }, { 'user-agent': 'Mozilla/5.0 (X11; Linux x86_64; rv:128.0) Gecko/20100101 Firefox/128.0' })
    const list = (await client.get('/api/account/sessions')).body
    expect(list).toHaveLength(2)
    expect(list.filter((s: { current: boolean }) => s.current)).toHaveLength(1)
    const firefox = list.find((s: { device: string }) => s.device === 'Firefox on Linux')
    expect(firefox).toMatchObject({ current: false })
    expect(Date.parse(firefox.createdAt)).toBeGreaterThan(Date.now() - 60_000)
    const stranger = await newSignedInUser()
    expect((await stranger.client.delete(`/api/account/sessions/${firefox.id}`)).status).toBe(404)
    expect((await phone.get('/api/auth/me')).status).toBe(200)
  })

  it('revoking this browser\'s own session signs it out', async () => {
    const { client } = await newSignedInUser()
    const mine = ((await client.get('/api/account/sessions')).body as Array<{ id: string, current: boolean }>).find(s => s.current)!
    expect((await client.delete(`/api/account/sessions/${mine.id}`)).body).toEqual({ revoked: true, current: true })
    expect((await client.get('/api/auth/me')).status).toBe(401)
  })

  it('a cookie from before server-side sessions (no session id) is asked to sign in again', async () => {
    const { id, email } = await newSignedInUser('Old cookie')
    const fakeEvent = { context: { sessions: { 'nuxt-session': { id: randomUUID(), createdAt: Date.now(), data: { user: { id, email, name: 'Old cookie' }, version: 1 } } } } }
    const sealed = await sealSession(fakeEvent as never, { name: 'nuxt-session', password: process.env.NUXT_SESSION_PASSWORD!, maxAge: 60 * 60 })
    const old = new ApiClient()
    old.cookie = `nuxt-session=${sealed}`
    const answer = await old.get('/api/auth/me')
    expect(answer.status).toBe(401)
    expect(answer.body.message).toMatch(/sign in again/)
    expect((await old.get('/api/projects')).status).toBe(401)
  })

  it('keep only a hash of the session secret, never show it to the page, and write last-seen at most once a minute', async () => {
    const { client, id } = await newSignedInUser()
    const page = await client.get('/api/_auth/session')
    expect(JSON.stringify(page.body)).not.toMatch(/sid|secure/)
    const rows = (await sql('SELECT id, token_hash, user_agent, last_seen_at FROM sessions WHERE user_id = $1', [id])).rows
    expect(rows).toHaveLength(1)
    expect(rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/)
    const seen = rows[0].last_seen_at.getTime()
    await client.get('/api/auth/me')
    expect((await sql('SELECT last_seen_at FROM sessions WHERE id = $1', [rows[0].id])).rows[0].last_seen_at.getTime()).toBe(seen)
    await sql(`UPDATE sessions SET last_seen_at = now() - interval '2 minutes' WHERE id = $1`, [rows[0].id])
    await client.get('/api/auth/me')
    expect((await sql('SELECT last_seen_at FROM sessions WHERE id = $1', [rows[0].id])).rows[0].last_seen_at.getTime()).toBeGreaterThan(Date.now() - 60_000)
  })

  it('attack: a 5 kB User-Agent is stored cut to 200 characters', async () => {
    const email = `ua-${randomUUID()}@test.example`
    const client = new ApiClient()
    await client.request('POST', '/api/auth/signup', { email, name: 'Long agent', password: TEST_PASSWORD }, { 'user-agent': 'A'.repeat(5000) })
    const row = (await sql('SELECT s.user_agent FROM sessions s JOIN users u ON u.id = s.user_id WHERE u.email = $1', [email])).rows[0]
    expect(row.user_agent).toHaveLength(200)
  })

  it('attack: a cookie held before signing in again on the same browser stops working (no fixed session)', async () => {
    const { client, email } = await newSignedInUser()
    const before = copyOf(client)
    expect((await client.post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
    expect((await before.get('/api/auth/me')).status).toBe(401)
    expect((await client.get('/api/auth/me')).status).toBe(200)
  })

  it('"sign out everywhere" revokes every session row', async () => {
    const { client, id, email } = await newSignedInUser()
    await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })
    await client.post('/api/auth/signout-everywhere')
    expect((await sql('SELECT count(*)::int AS n FROM sessions WHERE user_id = $1 AND revoked_at IS NULL', [id])).rows[0].n).toBe(0)
  })
})

describe('password change', () => {
  it('needs the current password, ends every other session, keeps this one and mails a notice', async () => {
    const { client, email } = await newSignedInUser('Changes password')
    const desk = new ApiClient()
    await desk.post('/api/auth/signin', { email, password: TEST_PASSWORD })
    let answer: Awaited<ReturnType<ApiClient['post']>> | undefined
    const mail = await mailDuring([email], async () => {
      answer = await client.post('/api/account/password', { currentPassword: TEST_PASSWORD, newPassword: 'a-new-password-2026' })
    })
    expect(answer!.status, JSON.stringify(answer!.body)).toBe(200)
    expect(answer!.body).toEqual({ changed: true, otherSessionsEnded: 1 })
    expect((await client.get('/api/auth/me')).status).toBe(200)
    expect((await desk.get('/api/auth/me')).status).toBe(401)
    expect(mail).toHaveLength(1)
    expect(mail[0]!.subject).toBe('Your Portwright password was changed')
    expect(mail[0]!.text).toContain(`http://127.0.0.1:${process.env.PORTWRIGHT_TEST_PORT}/password-reset`)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(401)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: 'a-new-password-2026' })).status).toBe(200)
  })

  it('refuses a new password shorter than 12 characters, naming the field', async () => {
    const { client } = await newSignedInUser()
    const answer = await client.post('/api/account/password', { currentPassword: TEST_PASSWORD, newPassword: 'short' })
    expect(answer.status).toBe(400)
    expect(answer.body.data.fields.newPassword).toMatch(/at least 12 characters/)
  })

  it('attack: guessing the current password through a borrowed session is counted by the sign-in limiter', async () => {
    const { client, email } = await newSignedInUser()
    const statuses: number[] = []
    for (let i = 0; i < 6; i++) statuses.push((await client.post('/api/account/password', { currentPassword: `guess-number-${i}`, newPassword: 'taken-over-password' })).status)
    expect(statuses.slice(0, 5)).toEqual([403, 403, 403, 403, 403])
    expect(statuses[5]).toBe(429)
    // Even the right password is not checked from that address now, and sign-in from it is limited too.
    expect((await client.post('/api/account/password', { currentPassword: TEST_PASSWORD, newPassword: 'taken-over-password' })).status).toBe(429)
    const sameAddress = new ApiClient({ address: client.address })
    expect((await sameAddress.post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(429)
  })
})

describe('password reset by e-mail', () => {
  const ask = (email: string, client = new ApiClient()) => client.post('/api/auth/password-reset', { email })

  it('attack: the answer for a known and an unknown address is identical, and only the known one gets mail', async () => {
    const { email } = await newSignedInUser()
    const unknown = `nobody-${randomUUID()}@test.example`
    const answers: Array<Awaited<ReturnType<typeof ask>>> = []
    const mail = await mailDuring([email, unknown], async () => {
      answers.push(await ask(email))
      answers.push(await ask(unknown))
    }, 1)
    expect(answers[0]!.status).toBe(200)
    expect(answers[1]).toEqual(answers[0])
    expect(answers[0]!.body.message).toMatch(/If an account uses this address/)
    expect(mail.map(m => m.to)).toEqual([[email]])
  })

  it('a link sets a new password once, ends every session and mails a notice; only its SHA-256 is stored', async () => {
    const { client, email, id } = await newSignedInUser('Forgot it')
    const mail = await mailDuring([email], () => ask(email), 1)
    expect(mail[0]!.subject).toBe('Set a new Portwright password')
    expect(mail[0]!.text).toContain(`http://127.0.0.1:${process.env.PORTWRIGHT_TEST_PORT}/password-reset/`)
    const token = resetToken(mail[0]!)
    const stored = (await sql('SELECT token_hash, expires_at - created_at AS life FROM password_resets WHERE user_id = $1', [id])).rows
    expect(stored).toHaveLength(1)
    expect(stored[0].token_hash).toMatch(/^[0-9a-f]{64}$/)
    expect(stored[0].token_hash).not.toContain(token)
    expect(stored[0].life.minutes).toBe(30)

    const notice = await mailDuring([email], async () => {
      const done = await new ApiClient().post('/api/auth/password-reset/confirm', { token, password: 'found-it-again-2026' })
      expect(done.status, JSON.stringify(done.body)).toBe(200)
    })
    expect(notice.map(m => m.subject)).toEqual(['Your Portwright password was changed'])
    expect((await client.get('/api/auth/me')).status).toBe(401)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: 'found-it-again-2026' })).status).toBe(200)
  })

  it('attack: reusing a reset link', async () => {
    const { email } = await newSignedInUser()
    const token = resetToken((await mailDuring([email], () => ask(email), 1))[0]!)
    expect((await new ApiClient().post('/api/auth/password-reset/confirm', { token, password: 'first-use-password' })).status).toBe(200)
    const again = await new ApiClient().post('/api/auth/password-reset/confirm', { token, password: 'second-use-password' })
    expect(again.status).toBe(410)
    expect(again.body.message).toMatch(/used already/)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: 'second-use-password' })).status).toBe(401)
  })

  it('attack: an expired reset link', async () => {
    const { email, id } = await newSignedInUser()
    const token = resetToken((await mailDuring([email], () => ask(email), 1))[0]!)
    await sql(`UPDATE password_resets SET expires_at = now() - interval '1 second' WHERE user_id = $1`, [id])
    const late = await new ApiClient().post('/api/auth/password-reset/confirm', { token, password: 'too-late-password' })
    expect(late.status).toBe(410)
    expect(late.body.message).toMatch(/expired/)
    expect((await new ApiClient().post('/api/auth/signin', { email, password: TEST_PASSWORD })).status).toBe(200)
  })

  it('attack: a wrong, a malformed and a superseded reset token', async () => {
    const { email } = await newSignedInUser()
    const first = resetToken((await mailDuring([email], () => ask(email), 1))[0]!)
    const second = resetToken((await mailDuring([email], () => ask(email), 1))[0]!)
    const wrong = await new ApiClient().post('/api/auth/password-reset/confirm', { token: 'B'.repeat(43), password: 'wrong-token-password' })
    expect(wrong.status).toBe(404)
    expect(wrong.body.message).toMatch(/not valid/)
    const malformed = await new ApiClient().post('/api/auth/password-reset/confirm', { token: 'short', password: 'wrong-token-password' })
    expect(malformed.status).toBe(400)
    expect(malformed.body.data.fields.token).toMatch(/incomplete/)
    expect((await new ApiClient().post('/api/auth/password-reset/confirm', { token: first, password: 'older-link-password' })).status).toBe(404)
    expect((await new ApiClient().post('/api/auth/password-reset/confirm', { token: second, password: 'newest-link-password' })).status).toBe(200)
  })

  it('attack: a forged host header does not put another site into the reset link', async () => {
    const { email } = await newSignedInUser()
    const forger = new ApiClient({ origin: null })
    const mail = await mailDuring([email], () => forger.request('POST', '/api/auth/password-reset', { email }, { 'x-forwarded-host': 'evil.example', 'x-forwarded-proto': 'https' }), 1)
    expect(mail[0]!.text).not.toContain('evil.example')
    expect(mail[0]!.text).toContain(`http://127.0.0.1:${process.env.PORTWRIGHT_TEST_PORT}/password-reset/`)
  })

  it('attack: flooding one mailbox with reset mail: three an hour, then the same answer and no mail', async () => {
    const { email } = await newSignedInUser()
    const answers: Array<Awaited<ReturnType<typeof ask>>> = []
    const mail = await mailDuring([email], async () => {
      for (let i = 0; i < 5; i++) answers.push(await ask(email))
      // Give a fourth or fifth message time to arrive, were it sent.
      await new Promise(resolve => setTimeout(resolve, 1500))
    }, 3)
    expect(answers.every(a => a.status === 200 && a.body.message === answers[0]!.body.message)).toBe(true)
    expect(mail).toHaveLength(3)
  })

  it('limits one client address asking for many accounts', async () => {
    const address = `10.253.${Math.floor(Math.random() * 250)}.5`
    const statuses: number[] = []
    for (let i = 0; i < 11; i++) statuses.push((await ask(`spray-${i}-${randomUUID()}@test.example`, new ApiClient({ address }))).status)
    expect(statuses.slice(0, 10).every(s => s === 200)).toBe(true)
    expect(statuses[10]).toBe(429)
  })
})
