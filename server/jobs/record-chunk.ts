/**
 * Stores a finished chunk once per (job, index) and brings the job's progress and answer up to date from the
 * stored chunks alone, so a chunk run twice (its first worker killed after writing it) is never counted twice.
 */
import { QueryTypes, type Sequelize } from 'sequelize'
import { Job, JobChunk } from '../database/models'
import type { JobResult } from '../../shared/types/jobs'
import { notifyJobChanged } from './progress-channel'

export interface FinishedChunk { trials: number; passed: number; unsolved: number; outcome: unknown }

/** Records chunk `chunkIndex` of a job (ignored when already stored) and updates the job; returns its new state. */
export async function recordChunk(sequelize: Sequelize, jobId: string, chunkIndex: number, chunk: FinishedChunk): Promise<string | null> {
  return sequelize.transaction(async (transaction) => {
    // The job row's lock orders concurrent chunk writers, so the last one sees every chunk.
    const job = await Job.findByPk(jobId, { transaction, lock: transaction.LOCK.UPDATE })
    if (!job) return null
    if (job.state !== 'queued' && job.state !== 'running') return job.state
    await sequelize.query(
      `INSERT INTO job_chunks (job_id, chunk_index, trials, passed, unsolved, outcome) VALUES (:jobId, :chunkIndex, :trials, :passed, :unsolved, :outcome)
       ON CONFLICT (job_id, chunk_index) DO NOTHING`,
      { transaction, replacements: { jobId, chunkIndex, trials: chunk.trials, passed: chunk.passed, unsolved: chunk.unsolved, outcome: chunk.outcome === null ? null : JSON.stringify(chunk.outcome) } },
    )
    const [sums] = await sequelize.query<{ chunks: string; trials: string | null; passed: string | null; unsolved: string | null }>(
      'SELECT count(*) AS chunks, sum(trials) AS trials, sum(passed) AS passed, sum(unsolved) AS unsolved FROM job_chunks WHERE job_id = :jobId',
      { transaction, type: QueryTypes.SELECT, replacements: { jobId } },
    )
    const chunks = Number(sums!.chunks)
    const complete = chunks >= job.chunkCount
    const p = job.parameters
    let result: JobResult | null = null
    if (complete && p.kind === 'tolerance') {
      const trials = Number(sums!.trials ?? 0)
      const passed = Number(sums!.passed ?? 0)
      result = { kind: 'tolerance', trials, passed, unsolved: Number(sums!.unsolved ?? 0), yield: trials ? passed / trials : 0, seed: p.seed }
    } else if (complete) {
      const stored = await JobChunk.findOne({ where: { jobId, chunkIndex: 0 }, transaction })
      result = { kind: 'optimize', ...(stored!.outcome as Omit<Extract<JobResult, { kind: 'optimize' }>, 'kind'>) }
    }
    const progressDone = p.kind === 'tolerance' ? Number(sums!.trials ?? 0) : chunks
    await job.update({
      progressDone,
      ...(complete ? { state: 'done', result, finishedAt: new Date() } : { state: 'running' }),
    }, { transaction })
    await notifyJobChanged(jobId, transaction)
    return job.state
  })
}

/** Marks a job failed with a message in the user's words (a chunk over budget, a document that cannot be run). */
export async function failJob(jobId: string, message: string): Promise<void> {
  const [changed] = await Job.update({ state: 'failed', error: message, finishedAt: new Date() }, { where: { id: jobId, state: ['queued', 'running'] } })
  if (changed) await notifyJobChanged(jobId)
}
