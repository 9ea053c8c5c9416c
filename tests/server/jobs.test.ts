import { spawn, type ChildProcess } from 'node:child_process'
import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { JobDto } from '../../shared/types/jobs'
import { newSignedInUser } from '../support/http'

/**
 * Long runs through the queue: two `npm run worker` processes on the test database, one killed (SIGKILL) in the
 * middle of a run. The run still completes, its yield is the one `npm run -s tolerance` gives for the same seed
 * and trials (trial t draws from (seed, t, key) alone), and every chunk is counted once.
 */
type Person = Awaited<ReturnType<typeof newSignedInUser>>
let owner: Person, viewer: Person
let base: string
let db: pg.Client
const root = process.cwd()
const examplePath = 'shared/examples/branch-line-tolerances.json'
const document = JSON.parse(readFileSync(join(root, examplePath), 'utf8'))

interface Worker { child: ChildProcess; output: () => string }
const workers: Worker[] = []

/** `npm run worker` in a process group of its own, so a kill reaches npm, tsx and node alike. */
function startWorker(): Promise<Worker> {
  const child = spawn('npm', ['run', '-s', 'worker'], {
    cwd: root,
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...process.env,
      NUXT_DATABASE_URL: process.env.PORTWRIGHT_TEST_DATABASE_URL!,
      // A lost chunk comes back after budget + 15 s; the queue's upkeep looks every 2 s.
      PORTWRIGHT_JOB_CHUNK_TIME_LIMIT_MS: '30000',
      PORTWRIGHT_JOB_MAINTENANCE_SECONDS: '2',
    },
  })
  let text = ''
  child.stdout!.on('data', (d) => { text += d })
  child.stderr!.on('data', (d) => { text += d })
  const worker = { child, output: () => text }
  workers.push(worker)
  return until(() => text.includes('taking tolerance and optimisation runs'), 60_000, () => `worker did not start:\n${text}`).then(() => worker)
}

function killGroup(worker: Worker, signal: NodeJS.Signals): void {
  try { process.kill(-worker.child.pid!, signal) } catch { /* already gone */ }
}

async function until(check: () => boolean | Promise<boolean>, timeoutMs: number, what: () => string, everyMs = 250): Promise<void> {
  const end = Date.now() + timeoutMs
  while (!(await check())) {
    if (Date.now() > end) throw new Error(what())
    await new Promise(r => setTimeout(r, everyMs))
  }
}

/** `npm run -s tolerance` on the same file, seed and trials: the answer the queue must reproduce. */
function cliYield(trials: number, seed: number): Promise<{ trials: number; passed: number; yield: number }> {
  return new Promise((resolve, reject) => {
    const child = spawn('npm', ['run', '-s', 'tolerance', '--', examplePath, '--trials', String(trials), '--seed', String(seed)], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] })
    let out = ''
    child.stdout.on('data', (d) => { out += d })
    child.on('exit', code => (code === 0 ? resolve(JSON.parse(out)) : reject(new Error(`tolerance exited ${code}`))))
  })
}

async function job(networkId: string, jobId: string): Promise<JobDto> {
  const answer = await viewer.client.get(`${base}/networks/${networkId}/jobs/${jobId}`)
  expect(answer.status, JSON.stringify(answer.body)).toBe(200)
  return answer.body
}

async function chunkRows(jobId: string): Promise<Array<{ chunk_index: number; trials: number }>> {
  return (await db.query('SELECT chunk_index, trials FROM job_chunks WHERE job_id = $1 ORDER BY chunk_index', [jobId])).rows
}

let networkId: string

beforeAll(async () => {
  owner = await newSignedInUser('Quinn Queue')
  viewer = await newSignedInUser('Vera Viewer')
  const project = await owner.client.post('/api/projects', { name: 'Queue bench' })
  base = `/api/projects/${project.body.id}`
  await owner.client.post(`${base}/members`, { email: viewer.email, role: 'viewer' })
  const made = await owner.client.post(`${base}/networks`, { name: 'Branch line with tolerances', document })
  expect(made.status, JSON.stringify(made.body)).toBe(201)
  networkId = made.body.id
  db = new pg.Client({ connectionString: process.env.PORTWRIGHT_TEST_DATABASE_URL })
  await db.connect()
  await Promise.all([startWorker(), startWorker()])
}, 120_000)

afterAll(async () => {
  for (const w of workers) {
    // A worker left paused by a failed test would not act on SIGTERM.
    killGroup(w, 'SIGCONT')
    killGroup(w, 'SIGTERM')
  }
  await db?.end()
})

describe('the job queue', () => {
  it('a run survives a worker killed mid-run: it completes, equals the command-line yield, and counts each chunk once', async () => {
    const trials = 6000
    const seed = 7
    const expected = cliYield(trials, seed)
    // The other worker of this file waits, paused, until the victim is killed: left running, it could take
    // every chunk after the victim's first one, and the victim would never be in the middle of a second.
    const [victim, other] = workers
    killGroup(other!, 'SIGSTOP')
    const sent = await owner.client.post(`${base}/networks/${networkId}/jobs`, { kind: 'tolerance', trials, seed })
    expect(sent.status, JSON.stringify(sent.body)).toBe(201)
    expect(sent.body).toMatchObject({ state: 'queued', progressDone: 0, progressTotal: trials })
    const jobId = sent.body.id as string
    // The victim has finished one chunk of this run and is in the middle of another when it is killed.
    const counts = () => {
      const out = victim!.output()
      const ofThisRun = (pattern: string) => (out.match(new RegExp(`job ${jobId} chunk \\d+/6: ${pattern}`, 'g')) ?? []).length
      return { started: ofThisRun('started'), finished: ofThisRun('\\d+ trials') }
    }
    await until(() => {
      const { started, finished } = counts()
      return finished >= 1 && started > finished
    }, 120_000, () => `the first worker never was in the middle of a second chunk:\n${victim!.output()}`, 20)
    killGroup(victim!, 'SIGKILL')
    killGroup(other!, 'SIGCONT')
    const seen: number[] = []
    await until(async () => {
      const now = await job(networkId, jobId)
      seen.push(now.progressDone)
      return now.state === 'done' || now.state === 'failed'
    }, 180_000, () => `the run did not finish; progress seen ${seen.join(', ')}`)
    const done = await job(networkId, jobId)
    const cli = await expected
    expect(done.state).toBe('done')
    expect(done.result).toEqual({ kind: 'tolerance', trials, passed: cli.passed, unsolved: 0, yield: cli.yield, seed })
    expect(done.progressDone).toBe(trials)
    // Progress only ever grows, one chunk at a time.
    expect(seen).toEqual([...seen].sort((a, b) => a - b))
    expect(seen.every(p => p % 1000 === 0)).toBe(true)
    const chunks = await chunkRows(jobId)
    expect(chunks.map(c => c.chunk_index)).toEqual([0, 1, 2, 3, 4, 5])
    expect(chunks.every(c => c.trials === 1000)).toBe(true)
    // The killed worker's chunk went back to the queue and ran again elsewhere.
    const retried = await db.query(`SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'portwright-job-chunk' AND data->>'jobId' = $1 AND retry_count > 0`, [jobId])
    expect(retried.rows[0].n).toBeGreaterThanOrEqual(1)
  }, 300_000)

  it('cancel stops a run: its state says so and no further chunk is stored', async () => {
    const sent = await owner.client.post(`${base}/networks/${networkId}/jobs`, { kind: 'tolerance', trials: 200_000, seed: 3 })
    expect(sent.status).toBe(201)
    const jobId = sent.body.id as string
    await until(async () => (await job(networkId, jobId)).state === 'running', 60_000, () => 'the run never started')
    const cancelled = await owner.client.post(`${base}/networks/${networkId}/jobs/${jobId}/cancel`, {})
    expect(cancelled.status).toBe(200)
    expect(cancelled.body.state).toBe('cancelled')
    const atCancel = (await chunkRows(jobId)).length
    await new Promise(r => setTimeout(r, 8000))
    const later = await chunkRows(jobId)
    expect(later.length).toBe(atCancel)
    expect(later.length).toBeLessThan(200)
    expect((await job(networkId, jobId)).state).toBe('cancelled')
    // Cancelling a finished run leaves it as it is.
    const again = await owner.client.post(`${base}/networks/${networkId}/jobs/${jobId}/cancel`, {})
    expect(again.body.state).toBe('cancelled')
  }, 120_000)

  it('refuses runs past the size limits, from viewers, and of networks without a spec, naming what is wrong', async () => {
    const path = `${base}/networks/${networkId}/jobs`
    const tooMany = await owner.client.post(path, { kind: 'tolerance', trials: 200_001, seed: 1 })
    expect(tooMany.status).toBe(400)
    expect(tooMany.body.message).toMatch(/trials must be at most 200,000/)
    const tooLong = await owner.client.post(path, { kind: 'optimize', maxEvaluations: 20_001, seed: 1 })
    expect(tooLong.status).toBe(400)
    expect(tooLong.body.message).toMatch(/maxEvaluations must be at most 20,000/)
    expect((await viewer.client.post(path, { kind: 'tolerance', trials: 10, seed: 1 })).status).toBe(403)
    const { spec: _spec, ...withoutSpec } = document
    const plain = await owner.client.post(`${base}/networks`, { name: 'No spec', document: withoutSpec })
    expect(plain.status, JSON.stringify(plain.body)).toBe(201)
    const refused = await owner.client.post(`${base}/networks/${plain.body.id}/jobs`, { kind: 'tolerance', trials: 10, seed: 1 })
    expect(refused.status).toBe(422)
    expect(refused.body.message).toMatch(/spec/)
    const list = await viewer.client.get(path)
    expect(list.status).toBe(200)
    expect(list.body.length).toBeGreaterThanOrEqual(2)
    expect(list.body[0]).not.toHaveProperty('document')
  })

  it('an optimisation runs through the queue and returns the tuned values and document', async () => {
    const sent = await owner.client.post(`${base}/networks/${networkId}/jobs`, { kind: 'optimize', maxEvaluations: 300, seed: 1 })
    expect(sent.status).toBe(201)
    await until(async () => ['done', 'failed'].includes((await job(networkId, sent.body.id)).state), 120_000, () => 'the optimisation did not finish')
    const done = await job(networkId, sent.body.id)
    expect(done.state, done.error ?? '').toBe('done')
    expect(done.result).toMatchObject({ kind: 'optimize' })
    const result = done.result as Extract<JobDto['result'], { kind: 'optimize' }>
    expect(result.evaluations).toBeGreaterThan(0)
    expect(result.evaluations).toBeLessThanOrEqual(300)
    expect(result.values.map(v => v.key).sort()).toEqual(['BR14.impedance', 'BR23.impedance', 'T12.impedance', 'T43.impedance'])
  }, 150_000)
})
