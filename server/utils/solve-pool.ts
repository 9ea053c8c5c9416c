import { existsSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { Piscina } from 'piscina'
import summariseInProcess, { type SummaryTask } from '~~/server/workers/solve-summary'
import solveApiInProcess, { type ApiSolveTask } from '~~/server/workers/solve-api'
import readTouchstoneInProcess, { type ReadTouchstoneOutcome, type ReadTouchstoneTask } from '~~/server/workers/read-touchstone'
import checkJobInProcess, { type JobCheckTask } from '~~/server/workers/check-job'
import type { SnapshotSummary } from '#shared/review/snapshot-summary'
import type { ApiSolveOutcome } from '#shared/automation/api-solve'

/** File name of the bundled worker beside the built server's entry (`.output/server/workers/`). */
export const SOLVE_WORKER_FILE = 'workers/solve-summary.mjs'
/** File name of the bundled automation-API solve worker. */
export const API_SOLVE_WORKER_FILE = 'workers/solve-api.mjs'
/** File name of the bundled Touchstone reader (uploads, and stored files read again for the editor). */
export const READ_TOUCHSTONE_WORKER_FILE = 'workers/read-touchstone.mjs'
/** File name of the bundled check of a run before it is queued. */
export const CHECK_JOB_WORKER_FILE = 'workers/check-job.mjs'

const envNumber = (name: string, fallback: number): number => {
  const value = Number(process.env[name])
  return Number.isFinite(value) && value > 0 ? value : fallback
}

/** Time and memory budget of one server-side solve (PORTWRIGHT_SOLVE_TIME_LIMIT_MS, PORTWRIGHT_SOLVE_MEMORY_MB). */
export function solveBudget(): { timeMs: number; memoryMb: number } {
  return { timeMs: envNumber('PORTWRIGHT_SOLVE_TIME_LIMIT_MS', 10_000), memoryMb: envNumber('PORTWRIGHT_SOLVE_MEMORY_MB', 256) }
}

const pools = new Map<string, Piscina | null>()

function workerFile(file: string): string | null {
  // The built server is started as `node .output/server/index.mjs`; its bundled workers sit beside it.
  const entry = process.argv[1]
  const candidate = entry ? join(dirname(entry), file) : ''
  return candidate && existsSync(candidate) ? candidate : null
}

/** One pool per worker entry, each with the same budget. */
function usePool(file: string): Piscina | null {
  const existing = pools.get(file)
  if (existing !== undefined) return existing
  const filename = workerFile(file)
  if (!filename) {
    // Only `nuxt dev` has no bundled worker; there solves run in-process, as a developer's machine can afford.
    console.warn(`[solve] no bundled worker ${file} found; solving in-process (development only)`)
    pools.set(file, null)
    return null
  }
  const { memoryMb } = solveBudget()
  const pool = new Piscina({
    filename,
    minThreads: 1,
    maxThreads: 2,
    idleTimeout: 60_000,
    // A queue this long means the server is being flooded; refusing is kinder than waiting minutes.
    maxQueue: 32,
    resourceLimits: { maxOldGenerationSizeMb: memoryMb, maxYoungGenerationSizeMb: Math.max(16, Math.round(memoryMb / 8)) },
  })
  pools.set(file, pool)
  return pool
}

function overBudget(message: string) {
  return createError({ statusCode: 422, message })
}

/**
 * A snapshot summary solved in the pool, within the time and memory budget; past either the request answers
 * 422 in plain words, the worker is replaced and the server carries on.
 */
export function summariseInPool(task: SummaryTask): Promise<SnapshotSummary> {
  return runInPool(SOLVE_WORKER_FILE, task, summariseInProcess)
}

/** An automation-API solve in the pool, within the same budget: the contract's JSON text, or problems. */
export function solveApiInPool(task: ApiSolveTask): Promise<ApiSolveOutcome> {
  return runInPool(API_SOLVE_WORKER_FILE, task, solveApiInProcess)
}

/** A Touchstone file read in the pool, within the same budget, so a large upload never holds the event loop. */
export function readTouchstoneInPool(task: ReadTouchstoneTask): Promise<ReadTouchstoneOutcome> {
  return runInPool(READ_TOUCHSTONE_WORKER_FILE, task, readTouchstoneInProcess, 'file')
}

/** Problems that would stop a queued run (none: it may be queued), found in the pool within the same budget. */
export function checkJobInPool(task: JobCheckTask): Promise<string[]> {
  return runInPool(CHECK_JOB_WORKER_FILE, task, checkJobInProcess)
}

async function runInPool<T, R>(file: string, task: T, inProcess: (task: T) => R, what: 'network' | 'file' = 'network'): Promise<R> {
  const workers = usePool(file)
  if (!workers) return inProcess(task)
  const { timeMs, memoryMb } = solveBudget()
  try {
    return await workers.run(task, { signal: AbortSignal.timeout(timeMs) }) as R
  } catch (error) {
    const e = error as Error & { code?: string; name?: string }
    const [doing, advice] = what === 'network'
      ? ['to solve', 'Make the sweep shorter or the network smaller and try again.']
      : ['to read', 'Send a smaller file (fewer frequencies or ports) and try again.']
    if (e.name === 'AbortError' || e.name === 'TimeoutError' || /aborted/i.test(e.message)) {
      throw overBudget(`The ${what} took longer than ${timeMs / 1000} s ${doing} on the server, so it was stopped. ${advice}`)
    }
    if (e.code === 'ERR_WORKER_OUT_OF_MEMORY' || /out of memory/i.test(e.message)) {
      throw overBudget(`The ${what} needed more than ${memoryMb} MB ${doing} on the server, so it was stopped. ${advice}`)
    }
    if (/queue is full/i.test(e.message)) throw createError({ statusCode: 503, message: `The server is busy with too many ${what}s at once; try again in a moment.` })
    throw error
  }
}
