/**
 * `npx tsx scripts/bench-queue.ts [--workers 2] [--jobs 4] [--trials 2000]`
 * Runs tolerance jobs through the queue (pg-boss on a private PostgreSQL cluster of its own, under .data/bench-queue)
 * with N `npm run worker` processes and prints one JSON line: jobs per second and trials per second, from the first
 * job sent to the last one done. Set PORTWRIGHT_BENCH_DB_PORT to move its database port (default 54349).
 */
import { spawn, type ChildProcess } from 'node:child_process'
import { readFileSync, rmSync } from 'node:fs'
import { resolve } from 'node:path'
import { parseArgs } from 'node:util'
import { connectDatabase } from '../server/database/connect'
import { Job, Network } from '../server/database/models'
import { PLAN_QUEUE, openQueue } from '../server/jobs/queue'
import { JOB_CHUNK_TRIALS } from '../shared/schemas/jobs'
import { prepareDatabase } from './lib/database-setup'
import { databaseUrl, ensureCluster, ensureDatabase, reachableDataDir, startCluster, stopCluster, type Cluster } from './lib/postgres'

const root = resolve(import.meta.dirname, '..')
const { values } = parseArgs({ options: { workers: { type: 'string', default: '2' }, jobs: { type: 'string', default: '4' }, trials: { type: 'string', default: '2000' } } })
const workerCount = Number(values.workers)
const jobCount = Number(values.jobs)
const trials = Number(values.trials)
const cluster: Cluster = { dataDir: reachableDataDir(resolve(root, '.data', 'bench-queue', 'postgres')), port: Number(process.env.PORTWRIGHT_BENCH_DB_PORT ?? 54349), unsafeFast: true }

async function main(): Promise<void> {
  stopCluster(cluster)
  rmSync(resolve(cluster.dataDir, '..'), { recursive: true, force: true })
  ensureCluster(cluster)
  await startCluster(cluster)
  const workers: ChildProcess[] = []
  try {
    await ensureDatabase(cluster, 'portwright')
    const url = databaseUrl(cluster, 'portwright')
    await prepareDatabase(url, { seed: true })
    const sequelize = connectDatabase(url)
    const boss = await openQueue(url, { supervise: false })
    const network = (await Network.findOne())!
    const document = JSON.parse(readFileSync(resolve(root, 'shared/examples/branch-line-tolerances.json'), 'utf8'))
    for (let i = 0; i < workerCount; i++) {
      workers.push(spawn(process.execPath, ['--import', 'tsx', resolve(root, 'scripts/worker.ts')], { cwd: root, env: { ...process.env, NUXT_DATABASE_URL: url }, stdio: ['ignore', 'pipe', 'inherit'] }))
    }
    await Promise.all(workers.map(w => new Promise<void>((ready) => {
      w.stdout!.on('data', (d: Buffer) => { if (d.toString().includes('taking tolerance')) ready() })
    })))
    const started = performance.now()
    const ids: string[] = []
    for (let i = 0; i < jobCount; i++) {
      const job = await Job.create({
        projectId: network.projectId, networkId: network.id, ownerId: null, kind: 'tolerance', document,
        parameters: { kind: 'tolerance', trials, seed: i + 1, chunkTrials: JOB_CHUNK_TRIALS },
        chunkCount: Math.ceil(trials / JOB_CHUNK_TRIALS), progressTotal: trials,
      })
      await boss.send(PLAN_QUEUE, { jobId: job.id }, { id: job.id })
      ids.push(job.id)
    }
    while (await Job.count({ where: { id: ids, state: ['queued', 'running'] } })) await new Promise(r => setTimeout(r, 100))
    const seconds = (performance.now() - started) / 1000
    const failed = await Job.count({ where: { id: ids, state: 'failed' } })
    console.log(JSON.stringify({
      workers: workerCount, jobs: jobCount, trialsPerJob: trials, failed, seconds: Number(seconds.toFixed(2)),
      jobsPerSecond: Number((jobCount / seconds).toFixed(3)), trialsPerSecond: Math.round((jobCount * trials) / seconds),
    }))
    await boss.stop({ graceful: false })
    await sequelize.close()
  } finally {
    for (const w of workers) w.kill('SIGTERM')
    await new Promise(r => setTimeout(r, 2000))
    stopCluster(cluster)
  }
}

main().then(() => process.exit(0), (error) => {
  console.error(`bench-queue: ${error instanceof Error ? error.message : error}`)
  stopCluster(cluster)
  process.exit(1)
})
