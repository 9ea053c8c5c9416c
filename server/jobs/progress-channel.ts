/**
 * Job changes (started, a chunk stored, finished, failed, cancelled) are announced on a PostgreSQL channel that
 * the app LISTENs on, so pages see progress as it happens instead of asking every second. A notification is a
 * hint: the listener reads the job row itself. Relative imports only (the queue worker loads this outside Nuxt).
 */
import type { Transaction } from 'sequelize'
import { Job } from '../database/models'

/** Channel of job changes; the payload is "<networkId> <jobId>". */
export const JOB_PROGRESS_CHANNEL = 'portwright_job_progress'

/** Announces that a job changed (inside `transaction`, the notice goes out when it commits). Never throws. */
export async function notifyJobChanged(jobId: string, transaction?: Transaction): Promise<void> {
  try {
    await Job.sequelize!.query(
      `SELECT pg_notify('${JOB_PROGRESS_CHANNEL}', network_id::text || ' ' || id::text) FROM jobs WHERE id = :jobId`,
      { replacements: { jobId }, transaction },
    )
  } catch (error) {
    // Pages fall back to reading the list; a lost notice costs only promptness.
    console.warn(`[jobs] could not announce a change of job ${jobId}: ${(error as Error).message}`)
  }
}
