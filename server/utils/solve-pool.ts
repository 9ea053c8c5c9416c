import { existsSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { Piscina } from 'piscina'
import summariseInProcess, { type SummaryTask } from '../workers/solve-summary'
import type { SnapshotSummary } from '../../shared/review/snapshot-summary'

/** File name of the bundled worker beside the built server's entry (`.output/server/workers/`). */
export const SOLVE_WORKER_FILE = 'workers/solve-summary.mjs'

const envNumber = (name: string, fallback: number): number => {
  const value = Number(process.env[name])
  return Number.isFinite(value) && value > 0 ? value : fallback
}

/** Time and memory budget of one server-side solve (PORTWRIGHT_SOLVE_TIME_LIMIT_MS, PORTWRIGHT_SOLVE_MEMORY_MB). */
export function solveBudget(): { timeMs: number; memoryMb: number } {
  return { timeMs: envNumber('PORTWRIGHT_SOLVE_TIME_LIMIT_MS', 10_000), memoryMb: envNumber('PORTWRIGHT_SOLVE_MEMORY_MB', 256) }
}

let pool: Piscina | null | undefined

function workerFile(): string | null {
  // The built server is started as `node .output/server/index.mjs`; its bundled worker sits beside it.
  const entry = process.argv[1]
  const candidate = entry ? join(dirname(entry), SOLVE_WORKER_FILE) : ''
  return candidate && existsSync(candidate) ? candidate : null
}

function usePool(): Piscina | null {
  if (pool !== undefined) return pool
  const filename = workerFile()
  if (!filename) {
    // Only `nuxt dev` has no bundled worker; there solves run in-process, as a developer's machine can afford.
    console.warn('[solve] no bundled solve worker found; solving in-process (development only)')
    pool = null
    return pool
  }
  const { memoryMb } = solveBudget()
  pool = new Piscina({
    filename,
    minThreads: 1,
    maxThreads: 2,
    idleTimeout: 60_000,
    // A queue this long means the server is being flooded; refusing is kinder than waiting minutes.
    maxQueue: 32,
    resourceLimits: { maxOldGenerationSizeMb: memoryMb, maxYoungGenerationSizeMb: Math.max(16, Math.round(memoryMb / 8)) },
  })
  return pool
}

function overBudget(message: string) {
  return createError({ statusCode: 422, message })
}

/**
 * A snapshot summary solved in the pool, within the time and memory budget; past either the request answers
 * 422 in plain words, the worker is replaced and the server carries on.
 */
export async function summariseInPool(task: SummaryTask): Promise<SnapshotSummary> {
  const workers = usePool()
  if (!workers) return summariseInProcess(task)
  const { timeMs, memoryMb } = solveBudget()
  try {
    return await workers.run(task, { signal: AbortSignal.timeout(timeMs) }) as SnapshotSummary
  } catch (error) {
    const e = error as Error & { code?: string; name?: string }
    if (e.name === 'AbortError' || e.name === 'TimeoutError' || /aborted/i.test(e.message)) {
      throw overBudget(`The network took longer than ${timeMs / 1000} s to solve on the server, so it was stopped. Make the sweep shorter or the network smaller and try again.`)
    }
    if (e.code === 'ERR_WORKER_OUT_OF_MEMORY' || /out of memory/i.test(e.message)) {
      throw overBudget(`The network needed more than ${memoryMb} MB to solve on the server, so it was stopped. Make the sweep shorter or the network smaller and try again.`)
    }
    if (/queue is full/i.test(e.message)) throw createError({ statusCode: 503, message: 'The server is solving too many networks at once; try again in a moment.' })
    throw error
  }
}
