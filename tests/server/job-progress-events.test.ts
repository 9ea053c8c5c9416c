import { spawn, type ChildProcess } from 'node:child_process'
import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { JobDto } from '../../shared/types/jobs'
import { appUrl } from '../support/app'
import { ApiClient, newSignedInUser } from '../support/http'

/**
 * Progress of queued runs reaches the page as server-sent events: a queue worker NOTIFYs on each change, the app
 * LISTENs and pushes the run to every member following the network. The test never reads the run list while
 * the run goes on: everything it sees came down the stream.
 */
type Person = Awaited<ReturnType<typeof newSignedInUser>>
let owner: Person, viewer: Person, outsider: Person
let base = '', networkId = ''
let worker: { child: ChildProcess; output: () => string } | undefined
const document = JSON.parse(readFileSync(join(process.cwd(), 'shared/examples/branch-line-tolerances.json'), 'utf8'))

interface StreamEvent { event: string; data: string }

/** An open event stream read as it arrives; `next` waits for the next event (or the stream's end: null). */
async function openStream(client: ApiClient, path: string) {
  const controller = new AbortController()
  const response = await fetch(appUrl(path), {
    headers: { cookie: client.cookie, 'x-forwarded-for': client.address, accept: 'text/event-stream' },
    signal: controller.signal,
  })
  const events: StreamEvent[] = []
  let ended = false
  let wake: (() => void) | undefined
  const pump = async () => {
    if (!response.body) { ended = true; return }
    const reader = response.body.pipeThrough(new TextDecoderStream()).getReader()
    let buffer = ''
    try {
      for (;;) {
        const { value, done } = await reader.read()
        if (done) break
        buffer += value
        let cut: number
        while ((cut = buffer.indexOf('\n\n')) >= 0) {
          const block = buffer.slice(0, cut)
          buffer = buffer.slice(cut + 2)
          const event = /^event: ?(.*)$/m.exec(block)?.[1] ?? 'message'
          const data = block.split('\n').filter(l => l.startsWith('data:')).map(l => l.replace(/^data: ?/, '')).join('\n')
          if (data) events.push({ event, data })
          wake?.()
        }
      }
    } catch { /* aborted */ }
    ended = true
    wake?.()
  }
  if (response.ok) void pump()
  let read = 0
  return {
    status: response.status,
    async next(timeoutMs = 60_000): Promise<StreamEvent | null> {
      const end = Date.now() + timeoutMs
      while (read >= events.length) {
        if (ended) return null
        if (Date.now() > end) throw new Error(`no event within ${timeoutMs} ms; worker:\n${worker?.output()}`)
        await new Promise<void>((resolve) => { wake = resolve; setTimeout(resolve, 250) })
      }
      return events[read++]!
    },
    close: () => controller.abort(),
  }
}

beforeAll(async () => {
  owner = await newSignedInUser('Petra Push')
  viewer = await newSignedInUser('Viktor Follower')
  outsider = await newSignedInUser('Otto Outside')
  const project = await owner.client.post('/api/projects', { name: 'Pushed progress' })
  base = `/api/projects/${project.body.id}`
  await owner.client.post(`${base}/members`, { email: viewer.email, role: 'viewer' })
  networkId = (await owner.client.post(`${base}/networks`, { name: 'Branch line', document })).body.id
  const child = spawn('npm', ['run', '-s', 'worker'], {
    cwd: process.cwd(),
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, NUXT_DATABASE_URL: process.env.PORTWRIGHT_TEST_DATABASE_URL!, PORTWRIGHT_JOB_MAINTENANCE_SECONDS: '2' },
  })
  let text = ''
  child.stdout!.on('data', (d) => { text += d })
  child.stderr!.on('data', (d) => { text += d })
  worker = { child, output: () => text }
  const end = Date.now() + 60_000
  while (!text.includes('taking tolerance and optimisation runs')) {
    if (Date.now() > end) throw new Error(`worker did not start:\n${text}`)
    await new Promise(r => setTimeout(r, 250))
  }
}, 120_000)

afterAll(() => {
  try { process.kill(-worker!.child.pid!, 'SIGTERM') } catch { /* already gone */ }
})

describe('run progress pushed to the page', () => {
  it('refuses the stream to callers without a session (401) and to non-members (404)', async () => {
    const path = `${base}/networks/${networkId}/jobs/events?seconds=1`
    expect((await fetch(appUrl(path))).status).toBe(401)
    const foreign = await openStream(outsider.client, path)
    expect(foreign.status).toBe(404)
  })

  it('a member following the network sees the run start, each part finish and the answer, without reading the list', async () => {
    const stream = await openStream(viewer.client, `${base}/networks/${networkId}/jobs/events`)
    expect(stream.status).toBe(200)
    const first = await stream.next(10_000)
    expect(first?.event).toBe('runs')
    expect(JSON.parse(first!.data)).toEqual([])

    const trials = 4000
    const sent = await owner.client.post(`${base}/networks/${networkId}/jobs`, { kind: 'tolerance', trials, seed: 5 })
    expect(sent.status, JSON.stringify(sent.body)).toBe(201)
    const seen: JobDto[] = []
    for (;;) {
      const event = await stream.next(120_000)
      expect(event, 'the stream ended before the run did').not.toBeNull()
      // The whole list comes again when the app's listener (re)connects: notices may have been missed meanwhile.
      if (event!.event === 'runs') continue
      expect(event!.event).toBe('run')
      const run = JSON.parse(event!.data) as JobDto
      expect(run.id).toBe(sent.body.id)
      expect(run).not.toHaveProperty('document')
      seen.push(run)
      if (run.state === 'done' || run.state === 'failed') break
    }
    stream.close()
    const last = seen[seen.length - 1]!
    expect(last.state, last.error ?? '').toBe('done')
    expect(last.result).toMatchObject({ kind: 'tolerance', trials, seed: 5 })
    // Progress came in steps of whole parts (1,000 trials), never going back; at least one step before the end.
    const progress = seen.map(r => r.progressDone)
    expect(progress).toEqual([...progress].sort((a, b) => a - b))
    expect(progress.every(p => p % 1000 === 0)).toBe(true)
    expect(seen.some(r => r.state === 'running' && r.progressDone > 0 && r.progressDone < trials)).toBe(true)
  }, 180_000)

  it('a member removed while following hears nothing more: the stream ends at the next change', async () => {
    const stream = await openStream(viewer.client, `${base}/networks/${networkId}/jobs/events`)
    expect((await stream.next(10_000))?.event).toBe('runs')
    const removed = await owner.client.delete(`${base}/members/${viewer.id}`)
    expect(removed.status).toBeLessThan(300)
    const sent = await owner.client.post(`${base}/networks/${networkId}/jobs`, { kind: 'tolerance', trials: 1000, seed: 9 })
    expect(sent.status).toBe(201)
    expect(await stream.next(60_000)).toBeNull()
  }, 90_000)

  it('ends the stream after the seconds asked for, so the browser reconnects through the gate', async () => {
    const started = Date.now()
    const stream = await openStream(owner.client, `${base}/networks/${networkId}/jobs/events?seconds=2`)
    expect((await stream.next(10_000))?.event).toBe('runs')
    // The run of the test before may still announce its end; the stream then ends by itself.
    let event: StreamEvent | null
    do event = await stream.next(20_000)
    while (event !== null)
    expect(Date.now() - started).toBeGreaterThanOrEqual(1500)
    expect(Date.now() - started).toBeLessThan(15_000)
  }, 30_000)
})
