import { spawn, type ChildProcess } from 'node:child_process'
import { availableParallelism } from 'node:os'
import { join } from 'node:path'
import { stopProcess } from './server-process'

/** How many queue workers `npm start` runs: PORTWRIGHT_WORKERS, or one per core the app server leaves spare (at least 1). */
export function workerCount(): number {
  const asked = Number(process.env.PORTWRIGHT_WORKERS)
  if (Number.isInteger(asked) && asked >= 0) return asked
  return Math.max(1, availableParallelism() - 1)
}

/** Starts `count` queue workers (scripts/worker.ts) on the database; their output goes to this terminal. */
export function startQueueWorkers(root: string, env: Record<string, string>, count: number): ChildProcess[] {
  return Array.from({ length: count }, () => spawn(process.execPath, ['--import', 'tsx', join(root, 'scripts', 'worker.ts')], {
    cwd: root,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'inherit', 'inherit'],
  }))
}

/** Stops every worker, each after the chunk it is running. */
export async function stopQueueWorkers(workers: ChildProcess[]): Promise<void> {
  await Promise.all(workers.map(w => stopProcess(w, 15_000)))
}
