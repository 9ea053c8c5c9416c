import { spawn, type ChildProcess } from 'node:child_process'
import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { newSignedInUser } from '../support/http'

/**
 * Finished runs leave no clutter: their queue messages move from `pgboss.job` to `pgboss.archive` (pg-boss's own
 * archive, on the retention the workers are started with) and their per-part rows are removed, while the answer
 * stays with the network. The worker here keeps finished messages 1 s and finished parts 1 s.
 */
let worker: { child: ChildProcess; output: () => string } | undefined
let db: pg.Client
const document = JSON.parse(readFileSync(join(process.cwd(), 'shared/examples/branch-line-tolerances.json'), 'utf8'))

async function until(check: () => boolean | Promise<boolean>, timeoutMs: number, what: () => string): Promise<void> {
  const end = Date.now() + timeoutMs
  while (!(await check())) {
    if (Date.now() > end) throw new Error(what())
    await new Promise(r => setTimeout(r, 500))
  }
}

beforeAll(async () => {
  db = new pg.Client({ connectionString: process.env.PORTWRIGHT_TEST_DATABASE_URL })
  await db.connect()
  const child = spawn('npm', ['run', '-s', 'worker'], {
    cwd: process.cwd(),
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...process.env,
      NUXT_DATABASE_URL: process.env.PORTWRIGHT_TEST_DATABASE_URL!,
      PORTWRIGHT_JOB_MAINTENANCE_SECONDS: '2',
      PORTWRIGHT_JOB_ARCHIVE_SECONDS: '1',
      PORTWRIGHT_JOB_CHUNKS_KEEP_SECONDS: '1',
    },
  })
  let text = ''
  child.stdout!.on('data', (d) => { text += d })
  child.stderr!.on('data', (d) => { text += d })
  worker = { child, output: () => text }
  await until(() => text.includes('taking tolerance and optimisation runs'), 60_000, () => `worker did not start:\n${text}`)
}, 120_000)

afterAll(async () => {
  try { process.kill(-worker!.child.pid!, 'SIGTERM') } catch { /* already gone */ }
  await db?.end()
})

describe('retention of finished runs', () => {
  it('archives a finished run’s queue messages and removes its parts, keeping the answer with the network', async () => {
    const owner = await newSignedInUser('Rhea Retention')
    const project = await owner.client.post('/api/projects', { name: 'Retention' })
    const base = `/api/projects/${project.body.id}`
    const networkId = (await owner.client.post(`${base}/networks`, { name: 'Branch line', document })).body.id
    const sent = await owner.client.post(`${base}/networks/${networkId}/jobs`, { kind: 'tolerance', trials: 2000, seed: 4 })
    expect(sent.status, JSON.stringify(sent.body)).toBe(201)
    const jobId = sent.body.id as string
    const read = async () => (await owner.client.get(`${base}/networks/${networkId}/jobs/${jobId}`)).body
    await until(async () => ['done', 'failed'].includes((await read()).state), 120_000, () => `the run did not finish\n${worker?.output()}`)

    const count = async (table: 'job' | 'archive') => Number((await db.query(
      `SELECT count(*) AS n FROM pgboss.${table} WHERE id = $1::uuid OR data->>'jobId' = $2`, [jobId, jobId])).rows[0].n)
    const parts = async () => Number((await db.query('SELECT count(*) AS n FROM job_chunks WHERE job_id = $1', [jobId])).rows[0].n)
    // One plan message and two chunk messages, all moved to the archive; both part rows gone.
    await until(async () => (await count('job')) === 0 && (await count('archive')) === 3 && (await parts()) === 0, 60_000,
      () => `not cleaned up\n${worker?.output()}`)
    const kept = await read()
    expect(kept.state).toBe('done')
    expect(kept.result).toMatchObject({ kind: 'tolerance', trials: 2000, seed: 4 })
    expect(kept.progressDone).toBe(2000)
  }, 200_000)
})
