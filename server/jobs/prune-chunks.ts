/**
 * Per-part rows of finished runs are only needed while a run goes on (they make a part count once); the answer is
 * summed into the `jobs` row when the run ends. This removes them some time after the run finished.
 */
import type { Sequelize } from 'sequelize'

/** Seconds the parts of a finished run are kept (PORTWRIGHT_JOB_CHUNKS_KEEP_SECONDS, default 1 day). */
export function chunkRowsKeepSeconds(): number {
  const value = Number(process.env.PORTWRIGHT_JOB_CHUNKS_KEEP_SECONDS)
  return Number.isInteger(value) && value >= 1 ? value : 86_400
}

/** Deletes the `job_chunks` rows of runs that finished (done, failed, cancelled) longer ago than the keep time. */
export async function pruneFinishedChunks(sequelize: Sequelize, keepSeconds = chunkRowsKeepSeconds()): Promise<number> {
  const [, meta] = await sequelize.query(
    `DELETE FROM job_chunks c USING jobs j
     WHERE c.job_id = j.id AND j.state IN ('done', 'failed', 'cancelled') AND j.finished_at < now() - make_interval(secs => :keep)`,
    { replacements: { keep: keepSeconds } },
  )
  return (meta as { rowCount?: number } | undefined)?.rowCount ?? 0
}
