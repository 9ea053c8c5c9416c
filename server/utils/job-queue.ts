import type PgBoss from 'pg-boss'
import { CHUNK_QUEUE, PLAN_QUEUE, chunkMessageId, openQueue, type PlanMessage } from '~~/server/jobs/queue'
import type { Job } from '~~/server/database/models'
import type { JobDto } from '#shared/types/jobs'

let opening: Promise<PgBoss> | undefined

/** The app's handle on the job queue (sending only; workers run the chunks and the queue's upkeep). */
function useQueue(): Promise<PgBoss> {
  if (!opening) {
    const url = useRuntimeConfig().databaseUrl || process.env.NUXT_DATABASE_URL
    if (!url) throw createError({ statusCode: 500, message: 'Database is not configured (NUXT_DATABASE_URL is empty).' })
    opening = openQueue(url, { supervise: false })
    opening.catch(() => { opening = undefined })
  }
  return opening
}

/** Puts a stored job on the queue; a worker cuts it into chunks. */
export async function enqueueJob(jobId: string): Promise<void> {
  const boss = await useQueue()
  await boss.send(PLAN_QUEUE, { jobId } satisfies PlanMessage, { id: jobId, retryLimit: 5, retryDelay: 2, expireInSeconds: 60 })
}

/**
 * Takes a cancelled job's waiting messages off the queue, so workers need not pick each up only to drop it.
 * Best effort: a message left behind is dropped by the worker that takes it, as the job is no longer running.
 */
export async function dequeueJob(jobId: string, chunkCount: number): Promise<void> {
  try {
    const boss = await useQueue()
    await boss.cancel(PLAN_QUEUE, jobId)
    const ids = Array.from({ length: chunkCount }, (_, i) => chunkMessageId(jobId, i))
    for (let i = 0; i < ids.length; i += 500) await boss.cancel(CHUNK_QUEUE, ids.slice(i, i + 500))
  } catch (error) {
    console.warn(`[jobs] could not take job ${jobId} off the queue: ${(error as Error).message}`)
  }
}

/** The plain answer for one job. */
export function toJobDto(job: Job): JobDto {
  return {
    id: job.id,
    networkId: job.networkId,
    kind: job.kind,
    parameters: job.parameters,
    state: job.state,
    progressDone: job.progressDone,
    progressTotal: job.progressTotal,
    result: job.result ?? null,
    error: job.error ?? null,
    ownerId: job.ownerId,
    createdAt: job.createdAt.toISOString(),
    startedAt: job.startedAt ? job.startedAt.toISOString() : null,
    finishedAt: job.finishedAt ? job.finishedAt.toISOString() : null,
  }
}
