/**
 * One queue worker: takes plan and chunk messages from pg-boss, runs each chunk in a worker thread within the
 * time and memory budget, and records it. Started by `npm run worker` (scripts/worker.ts), on this machine or any
 * other pointed at the same database.
 */
import { resolve } from 'node:path'
import { Piscina } from 'piscina'
import type PgBoss from 'pg-boss'
import { connectDatabase } from '../database/connect'
import { Job, JobChunk } from '../database/models'
import { CHUNK_QUEUE, PLAN_QUEUE, chunkMessageId, openQueue, type ChunkMessage, type PlanMessage } from './queue'
import { loadProjectInputs, type ProjectInputs } from './project-inputs'
import { notifyJobChanged } from './progress-channel'
import { pruneFinishedChunks } from './prune-chunks'
import { failJob, recordChunk } from './record-chunk'
import type { ChunkOutcome, ChunkTask } from './run-chunk'

const envNumber = (name: string, fallback: number): number => {
  const value = Number(process.env[name])
  return Number.isFinite(value) && value > 0 ? value : fallback
}

/** Budget of one chunk: PORTWRIGHT_JOB_CHUNK_TIME_LIMIT_MS (tolerance chunks), PORTWRIGHT_JOB_OPTIMIZE_TIME_LIMIT_MS, PORTWRIGHT_SOLVE_MEMORY_MB. */
export function chunkBudget(kind: 'tolerance' | 'optimize'): { timeMs: number; memoryMb: number } {
  return {
    timeMs: kind === 'tolerance' ? envNumber('PORTWRIGHT_JOB_CHUNK_TIME_LIMIT_MS', 120_000) : envNumber('PORTWRIGHT_JOB_OPTIMIZE_TIME_LIMIT_MS', 600_000),
    memoryMb: envNumber('PORTWRIGHT_SOLVE_MEMORY_MB', 256),
  }
}

const active = new Set(['queued', 'running'])

export interface RunningWorker { stop: () => Promise<void> }

/** Starts a worker on the database; resolves once it is taking messages. */
export async function startChunkWorker(databaseUrl: string, log: (line: string) => void = console.log): Promise<RunningWorker> {
  const sequelize = connectDatabase(databaseUrl, { pool: 3 })
  const boss = await openQueue(databaseUrl, { supervise: true, maintenanceSeconds: envNumber('PORTWRIGHT_JOB_MAINTENANCE_SECONDS', 30) })
  const { memoryMb } = chunkBudget('tolerance')
  const pool = new Piscina({
    filename: resolve(import.meta.dirname, 'run-chunk.ts'),
    minThreads: 1,
    maxThreads: 1,
    resourceLimits: { maxOldGenerationSizeMb: memoryMb, maxYoungGenerationSizeMb: Math.max(16, Math.round(memoryMb / 8)) },
  })

  const plan = async (jobId: string) => {
    const job = await Job.findByPk(jobId, { attributes: ['id', 'state', 'chunkCount', 'kind'] })
    if (!job || !active.has(job.state)) return
    const stored = new Set((await JobChunk.findAll({ where: { jobId }, attributes: ['chunkIndex'] })).map(c => c.chunkIndex))
    // A chunk whose worker vanishes comes back after its expiry: the budget plus a margin.
    const expireInSeconds = Math.ceil(chunkBudget(job.kind).timeMs / 1000) + 15
    for (let i = 0; i < job.chunkCount; i++) {
      if (stored.has(i)) continue
      await boss.send(CHUNK_QUEUE, { jobId, chunkIndex: i } satisfies ChunkMessage, { id: chunkMessageId(jobId, i), expireInSeconds, retryLimit: 5, retryDelay: 1 })
    }
  }

  const runChunk = async ({ jobId, chunkIndex }: ChunkMessage) => {
    const job = await Job.findByPk(jobId)
    if (!job || !active.has(job.state)) return
    if (await JobChunk.findOne({ where: { jobId, chunkIndex }, attributes: ['jobId'] })) {
      // Stored by a worker that stopped before finishing the message: only the totals need bringing up to date.
      await recordChunk(sequelize, jobId, chunkIndex, { trials: 0, passed: 0, unsolved: 0, outcome: null })
      return
    }
    if (job.state === 'queued') {
      const [started] = await Job.update({ state: 'running', startedAt: new Date() }, { where: { id: jobId, state: 'queued' } })
      if (started) await notifyJobChanged(jobId)
    }
    // Subnetworks and data files as the server's own solves see them; the files are read in the chunk's thread.
    const inputs: ProjectInputs = await loadProjectInputs(job.projectId, job.document)
    const { timeMs, memoryMb: mb } = chunkBudget(job.kind)
    const stop = new AbortController()
    const timer = setTimeout(() => stop.abort(new Error('time')), timeMs)
    // A cancelled job stops its running chunk within a second.
    const watch = setInterval(() => {
      Job.findByPk(jobId, { attributes: ['state'] }).then((j) => { if (!j || !active.has(j.state)) stop.abort(new Error('cancelled')) }).catch(() => {})
    }, 1000)
    let outcome: ChunkOutcome
    log(`[worker ${process.pid}] job ${jobId} chunk ${chunkIndex + 1}/${job.chunkCount}: started`)
    try {
      const task: ChunkTask = { parameters: job.parameters, document: job.document, networks: inputs.networks, files: inputs.files, chunkIndex }
      outcome = await pool.run(task, { signal: stop.signal }) as ChunkOutcome
    } catch (error) {
      const e = error as Error & { code?: string }
      const reason = (stop.signal.reason as Error | undefined)?.message
      if (reason === 'cancelled') return
      if (reason === 'time') {
        await failJob(jobId, `Part ${chunkIndex + 1} of the run took longer than ${timeMs / 1000} s on the server, so the run was stopped. Ask for fewer evaluations or make the sweep shorter.`)
        return
      }
      if (e.code === 'ERR_WORKER_OUT_OF_MEMORY' || /out of memory/i.test(e.message)) {
        await failJob(jobId, `The run needed more than ${mb} MB on the server, so it was stopped. Make the sweep shorter or the network smaller.`)
        return
      }
      throw error
    } finally {
      clearTimeout(timer)
      clearInterval(watch)
    }
    if (!outcome.ok) {
      await failJob(jobId, `The network cannot be run: ${outcome.problems.slice(0, 5).join('; ')}`)
      return
    }
    const state = await recordChunk(sequelize, jobId, chunkIndex, outcome)
    log(`[worker ${process.pid}] job ${jobId} chunk ${chunkIndex + 1}/${job.chunkCount}: ${outcome.trials} trials, ${outcome.passed} passed (${state})`)
  }

  // Upkeep of our own rows beside pg-boss's: the parts of runs finished a while ago.
  const maintenanceSeconds = envNumber('PORTWRIGHT_JOB_MAINTENANCE_SECONDS', 30)
  const prune = setInterval(() => {
    pruneFinishedChunks(sequelize).catch(error => log(`[worker ${process.pid}] could not remove parts of finished runs: ${(error as Error).message}`))
  }, maintenanceSeconds * 1000)
  prune.unref()

  const options = { batchSize: 1, pollingIntervalSeconds: 0.5 }
  await boss.work<PlanMessage>(PLAN_QUEUE, options, async ([message]) => { if (message) await plan(message.data.jobId) })
  await boss.work<ChunkMessage>(CHUNK_QUEUE, options, async ([message]) => { if (message) await runChunk(message.data) })

  return {
    stop: async () => {
      clearInterval(prune)
      await boss.stop({ graceful: true, wait: true, timeout: 10_000 })
      await pool.destroy()
      await sequelize.close()
    },
  }
}
