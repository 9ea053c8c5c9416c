// A signed-up stranger against the server that every team shares: each request below must be refused or
// bounded, while /api/health keeps answering and an honest team's snapshot still gives the right figures.
import { request as httpRequest } from 'node:http'
import { beforeAll, describe, expect, it } from 'vitest'
import { ApiClient, newSignedInUser } from '../support/http'

let stranger: Awaited<ReturnType<typeof newSignedInUser>>
let honest: Awaited<ReturnType<typeof newSignedInUser>>
let strangerProject: string
let honestProject: string

const appUrl = process.env.PORTWRIGHT_TEST_URL!

// An ideal quadrature hybrid fed at port 1: an equal split, |S21| = 1/√2, i.e. −3.0103 dB (Pozar, Microwave
// Engineering, 4th ed., §7.5, the branch-line coupler's S-matrix).
const quadratureSplit = (variables: Record<string, string> = {}) => ({
  format: 'portwright.network', version: 1, name: 'Quadrature split', referenceImpedance: 50,
  variables: { f0: '2 GHz', ...variables },
  sweep: { start: '1.5 GHz', stop: '2.5 GHz', points: 11 },
  blocks: [1, 2, 3, 4].map(i => ({ id: `P${i}`, type: 'port', params: { index: i } }))
    .concat([{ id: 'H', type: 'hybrid90', params: { model: 'ideal' } } as never]),
  wires: [['P1.1', 'H.1'], ['P2.1', 'H.2'], ['P3.1', 'H.3'], ['P4.1', 'H.4']],
})

async function honestSnapshotS21(): Promise<number> {
  const created = await honest.client.post(`/api/projects/${honestProject}/networks`, { name: `Honest ${crypto.randomUUID()}`, document: quadratureSplit() })
  expect(created.status).toBe(201)
  const snap = await honest.client.post(`/api/projects/${honestProject}/networks/${created.body.id}/snapshots`, { title: 'Honest' })
  expect(snap.status, JSON.stringify(snap.body)).toBe(201)
  return snap.body.summary.transfer.find((t: { to: number }) => t.to === 2).db
}

/** Raw HTTP, for bodies fetch will not send (a lying or missing Content-Length). */
function rawPost(path: string, headers: Record<string, string>, chunks: Buffer[]): Promise<number> {
  return new Promise((resolve, reject) => {
    const req = httpRequest(`${appUrl}${path}`, { method: 'POST', headers }, (res) => { res.resume(); resolve(res.statusCode ?? 0) })
    req.on('error', (error) => { (error as NodeJS.ErrnoException).code === 'EPIPE' || (error as NodeJS.ErrnoException).code === 'ECONNRESET' ? resolve(413) : reject(error) })
    for (const chunk of chunks) req.write(chunk)
    req.end()
  })
}

beforeAll(async () => {
  stranger = await newSignedInUser('Stranger')
  honest = await newSignedInUser('Honest Engineer')
  strangerProject = (await stranger.client.post('/api/projects', { name: 'Stranger bench' })).body.id
  honestProject = (await honest.client.post('/api/projects', { name: 'Honest bench' })).body.id
})

describe('hostile requests', () => {
  it('attack: config() in a variable reconfigured the shared maths instance for every later snapshot', async () => {
    const poison = await stranger.client.post(`/api/projects/${strangerProject}/networks`, { name: 'Poison', document: quadratureSplit({ poison: 'config({"number": "Fraction"})' }) })
    expect(poison.status).toBe(201)
    const snap = await stranger.client.post(`/api/projects/${strangerProject}/networks/${poison.body.id}/snapshots`, { title: 'Poison' })
    expect(snap.status).toBe(201)
    expect(await honestSnapshotS21()).toBeCloseTo(-3.0103, 3)
  })

  it('attack: sum(ones(3000,3000)) in a value held the event loop for seconds', async () => {
    const heavy = await stranger.client.post(`/api/projects/${strangerProject}/networks`, { name: 'Heavy', document: quadratureSplit({ heavy: 'sum(ones(3000,3000))' }) })
    expect(heavy.status).toBe(201)
    const health = new ApiClient().get('/api/health')
    const snap = await stranger.client.post(`/api/projects/${strangerProject}/networks/${heavy.body.id}/snapshots`, { title: 'Heavy' })
    expect(snap.status).toBe(201)
    expect(JSON.stringify(snap.body.summary)).toMatch(/uses the function sum, which is not available/)
    expect((await health).status).toBe(200)
  })

  it('attack: a request body of 3 MiB is refused before it is parsed', async () => {
    const big = 'x'.repeat(3 * 1024 * 1024)
    const answer = await stranger.client.post(`/api/projects/${strangerProject}/networks`, { name: 'Big', document: { ...quadratureSplit(), padding: big } })
    expect(answer.status).toBe(413)
    expect(answer.body.message).toMatch(/larger than 2 MiB/)
  })

  it('attack: a chunked body without Content-Length is counted as it arrives', async () => {
    const chunk = Buffer.alloc(256 * 1024, 0x20)
    const status = await rawPost('/api/auth/signin', { 'content-type': 'application/json', 'transfer-encoding': 'chunked' }, Array.from({ length: 12 }, () => chunk))
    expect(status).toBe(413)
    const declared = await rawPost('/api/auth/signin', { 'content-type': 'application/json', 'content-length': String(50 * 1024 * 1024) }, [Buffer.from('{}')])
    expect(declared).toBe(413)
  })

  it('attack: a document of a million blocks or a ten-million-point sweep', async () => {
    const sweep = await stranger.client.post(`/api/projects/${strangerProject}/networks`, { name: 'Long sweep', document: { ...quadratureSplit(), sweep: { start: 1e9, stop: 2e9, points: 10_000_000 } } })
    expect(sweep.status).toBe(422)
    expect(sweep.body.message).toMatch(/at most 20,001 points/)
    const blocks = Array.from({ length: 2_001 }, (_, i) => ({ id: `L${i}`, type: 'line', params: { impedance: 50, degrees: 90, at: 1e9 } }))
    const many = await stranger.client.post(`/api/projects/${strangerProject}/networks`, { name: 'Many blocks', document: { ...quadratureSplit(), blocks } })
    expect(many.status).toBe(422)
    expect(many.body.message).toMatch(/at most 2,000 blocks/)
  })

  it('attack: an allowed but heavy solve (a subnetwork used 135 times, each of 135 different microstrip lines, 2,001 points) is stopped at the budget', async () => {
    const inner = `Heavy inner ${crypto.randomUUID()}`
    // Microstrip lines of different widths: no two share a fill, and each fill runs the dispersion and loss models.
    const strip = (i: number) => ({ type: 'microstrip', params: { substrate: 'core', width: `${1 + i / 1000} mm`, length: '10 mm' } })
    const chain = (next: string | null) => {
      const ids = Array.from({ length: 135 }, (_, i) => `B${i}`)
      return {
        format: 'portwright.network', version: 1, name: 'Heavy', referenceImpedance: 50,
        sweep: { start: 1e9, stop: 2e9, points: 20_001 },
        substrates: { core: { permittivity: 3.5, height: '0.508 mm', thickness: '35 um', lossTangent: 0.003, conductivity: 5.8e7 } },
        blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } },
          ...ids.map((id, i) => (next ? { id, type: 'subnetwork', params: { network: next } } : { id, ...strip(i) }))],
        wires: [['P1.1', 'B0.1'], ...ids.slice(1).map((id, i) => [`B${i}.2`, `${id}.1`]), ['B134.2', 'P2.1']],
      }
    }
    expect((await stranger.client.post(`/api/projects/${strangerProject}/networks`, { name: inner, document: chain(null) })).status).toBe(201)
    const outer = await stranger.client.post(`/api/projects/${strangerProject}/networks`, { name: 'Heavy outer', document: chain(inner) })
    expect(outer.status).toBe(201)
    const started = performance.now()
    const snap = stranger.client.post(`/api/projects/${strangerProject}/networks/${outer.body.id}/snapshots`, { title: 'Heavy' })
    // While the worker grinds, the event loop answers everyone else.
    const healthTimes: number[] = []
    for (let i = 0; i < 5; i++) {
      const t = performance.now()
      expect((await new ApiClient().get('/api/health')).status).toBe(200)
      healthTimes.push(performance.now() - t)
      await new Promise(r => setTimeout(r, 200))
    }
    const refused = await snap
    const refusedAfter = performance.now() - started
    expect(refused.status).toBe(422)
    expect(refused.body.message).toMatch(/took longer than 3 s to solve on the server/)
    // Bounds, not speed targets: health stays responsive, the refusal comes near the (test run's 3 s) budget.
    expect(Math.max(...healthTimes)).toBeLessThan(1_000)
    expect(refusedAfter).toBeLessThan(15_000)
    console.log(`hostile solve refused after ${refusedAfter.toFixed(0)} ms; health ${healthTimes.map(t => t.toFixed(0)).join(', ')} ms`)
  })

  it('health keeps answering and an honest snapshot still gives S21 = −3.01 dB after all of the above', async () => {
    const started = performance.now()
    expect((await new ApiClient().get('/api/health')).status).toBe(200)
    // A bound, not a speed target: the event loop is free.
    expect(performance.now() - started).toBeLessThan(1_000)
    expect(await honestSnapshotS21()).toBeCloseTo(-3.0103, 3)
  })
})

describe('security headers', () => {
  it('attack: framing the app (clickjacking), sniffing a download as script, leaking URLs to other sites', async () => {
    for (const path of ['/signin', '/api/health', '/favicon.svg']) {
      const response = await fetch(`${appUrl}${path}`)
      expect(response.headers.get('x-content-type-options'), path).toBe('nosniff')
      expect(response.headers.get('x-frame-options'), path).toBe('DENY')
      expect(response.headers.get('referrer-policy'), path).toBe('strict-origin-when-cross-origin')
      expect(response.headers.get('content-security-policy'), path).toMatch(/frame-ancestors 'none'/)
    }
    const page = await fetch(`${appUrl}/signin`)
    const policy = page.headers.get('content-security-policy')!
    // Inline scripts are allowed by hash only; no 'unsafe-inline' or 'unsafe-eval' for scripts.
    const scriptSrc = policy.split('; ').find(d => d.startsWith('script-src'))!
    expect(scriptSrc).toMatch(/^script-src 'self'( 'sha256-[A-Za-z0-9+/=]+')+$/)
    expect(await page.text()).toContain('Portwright')
  })
})
