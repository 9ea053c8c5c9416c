import type PgBoss from 'pg-boss'
import { PLAN_QUEUE, openQueue, type PlanMessage } from '../jobs/queue'
import type { Job } from '../database/models'
import type { JobDto } from '../../shared/types/jobs'

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
