import { describe, expect, it } from 'vitest'
import { ApiClient, newSignedInUser, TEST_PASSWORD } from '../support/http'

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
