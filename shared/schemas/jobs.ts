import { z } from 'zod'

/** Most Monte Carlo trials one run may ask for. */
export const MAX_JOB_TRIALS = 200_000
/** Most optimiser evaluations one run may ask for. */
export const MAX_JOB_EVALUATIONS = 20_000
/** Trials per chunk: the unit of work, progress and retry. */
export const JOB_CHUNK_TRIALS = 1000

const seed = z.number({ message: 'seed must be a whole number' }).int('seed must be a whole number').min(0, 'seed must be 0 or more').max(2 ** 32 - 1, 'seed must be below 4294967296')

/** Body of "send a run to the server". */
export const submitJobSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('tolerance'),
    trials: z.number({ message: 'trials must be a whole number' }).int('trials must be a whole number').min(1, 'trials must be at least 1').max(MAX_JOB_TRIALS, `trials must be at most ${MAX_JOB_TRIALS.toLocaleString('en')}`),
    seed,
  }).strict(),
  z.object({
    kind: z.literal('optimize'),
    maxEvaluations: z.number({ message: 'maxEvaluations must be a whole number' }).int('maxEvaluations must be a whole number').min(1, 'maxEvaluations must be at least 1').max(MAX_JOB_EVALUATIONS, `maxEvaluations must be at most ${MAX_JOB_EVALUATIONS.toLocaleString('en')}`),
    seed,
  }).strict(),
], { message: 'kind must be "tolerance" or "optimize"' })

export type SubmitJobBody = z.infer<typeof submitJobSchema>
