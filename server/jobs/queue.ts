/**
 * The job queue on the app's PostgreSQL (pg-boss). The app sends one "plan" message per run; a worker expands it
 * into one message per chunk. Message ids are derived from (job, chunk), so sending a chunk twice queues it once.
 * Plain Node: used by the built server and by `npm run worker` alike.
 */
import { createHash } from 'node:crypto'
import PgBoss from 'pg-boss'

/** Queue of runs waiting to be cut into chunks. */
export const PLAN_QUEUE = 'portwright-job-plan'
/** Queue of chunks waiting for a worker. */
export const CHUNK_QUEUE = 'portwright-job-chunk'

/** What a chunk message carries: the job and which chunk. Everything else is read from the jobs row. */
export interface ChunkMessage { jobId: string; chunkIndex: number }
export interface PlanMessage { jobId: string }

/** A uuid made from the job and the chunk index, so a chunk is queued once however often it is sent. */
export function chunkMessageId(jobId: string, chunkIndex: number): string {
  const hex = createHash('sha256').update(`${jobId}:${chunkIndex}`).digest('hex')
  // Shaped as a version-5-like uuid (the variant and version bits set), which PostgreSQL's uuid type accepts.
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-5${hex.slice(13, 16)}-${((Number.parseInt(hex[16]!, 16) & 0x3) | 0x8).toString(16)}${hex.slice(17, 20)}-${hex.slice(20, 32)}`
}

const envSeconds = (name: string, fallback: number): number => {
  const value = Number(process.env[name])
  return Number.isInteger(value) && value >= 1 ? value : fallback
}

/**
 * How long finished queue messages are kept (seconds): in `pgboss.job` after they complete
 * (PORTWRIGHT_JOB_ARCHIVE_SECONDS, 1 hour) or fail (PORTWRIGHT_JOB_ARCHIVE_FAILED_SECONDS, 1 day), then in
 * `pgboss.archive` (PORTWRIGHT_JOB_ARCHIVE_KEEP_SECONDS, 7 days) before pg-boss deletes them. A run's answer is
 * kept in `jobs`, with its network, however long the messages are kept.
 */
export function queueRetention(): { archiveCompletedAfterSeconds: number; archiveFailedAfterSeconds: number; deleteAfterSeconds: number } {
  return {
    archiveCompletedAfterSeconds: envSeconds('PORTWRIGHT_JOB_ARCHIVE_SECONDS', 3600),
    archiveFailedAfterSeconds: envSeconds('PORTWRIGHT_JOB_ARCHIVE_FAILED_SECONDS', 86_400),
    deleteAfterSeconds: envSeconds('PORTWRIGHT_JOB_ARCHIVE_KEEP_SECONDS', 7 * 86_400),
  }
}

/**
 * Opens pg-boss on the database and makes sure both queues exist. `supervise` runs the queue's upkeep: the
 * expiry of lost chunks, and archiving and deleting finished messages (`queueRetention`).
 */
export async function openQueue(connectionString: string, options: { supervise: boolean; maintenanceSeconds?: number }): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString,
    max: 3,
    supervise: options.supervise,
    schedule: false,
    ...(options.supervise ? { maintenanceIntervalSeconds: options.maintenanceSeconds ?? 30, ...queueRetention() } : {}),
  })
  boss.on('error', error => console.error(`[jobs] queue: ${error.message}`))
  await boss.start()
  for (const name of [PLAN_QUEUE, CHUNK_QUEUE]) {
    if (!(await boss.getQueue(name))) await boss.createQueue(name).catch(() => { /* made by another process meanwhile */ })
  }
  return boss
}
