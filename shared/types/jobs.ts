/** Runs sent to the server's queue (tolerance = Monte Carlo yield, optimize = tuning towards the spec). */
export type JobKind = 'tolerance' | 'optimize'
export type JobState = 'queued' | 'running' | 'done' | 'failed' | 'cancelled'

export type JobParameters =
  | { kind: 'tolerance'; trials: number; seed: number; chunkTrials: number }
  | { kind: 'optimize'; seed: number; maxEvaluations: number }

/** A finished run's answer. Tolerance: summed from the stored chunks. Optimize: the tuned values. */
export type JobResult =
  | { kind: 'tolerance'; trials: number; passed: number; unsolved: number; yield: number; seed: number }
  | { kind: 'optimize'; met: boolean; evaluations: number; values: Array<{ key: string; value: number }>; document: unknown }

/** What the API answers for one job (never the stored copy of the document). */
export interface JobDto {
  id: string
  networkId: string
  kind: JobKind
  parameters: JobParameters
  state: JobState
  progressDone: number
  progressTotal: number
  result: JobResult | null
  error: string | null
  ownerId: string | null
  createdAt: string
  startedAt: string | null
  finishedAt: string | null
}
