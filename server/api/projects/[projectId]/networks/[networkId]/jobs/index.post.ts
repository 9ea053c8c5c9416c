import { JOB_CHUNK_TRIALS, submitJobSchema } from '#shared/schemas/jobs'
import { Job, Network } from '~~/server/database/models'
import { loadProjectInputs } from '~~/server/jobs/project-inputs'
import type { JobDto, JobParameters } from '#shared/types/jobs'

/** Runs a project may have waiting or running at once; more would let one team crowd out the rest. */
const MAX_UNFINISHED_PER_PROJECT = 5

/**
 * Sends a long tolerance (Monte Carlo) or optimisation run of the network to the server's queue (owners and
 * editors). The document as it is now is kept with the job; the answer is the queued job, polled for progress.
 */
export default defineEventHandler(async (event): Promise<JobDto> => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const body = await readBodyAs(event, submitJobSchema)
  const network = await requireNetwork(event, project.id)
  await requireMergedLiveState(network.id)
  const live = await Network.findByPk(network.id, { attributes: ['id', 'document'] })
  const document = live?.document ?? network.document
  // Problems with the document are named now, not after a worker has picked the run up: the same preparation
  // as every chunk (subnetworks, data files read from the project), in the solve pool's budget.
  const inputs = await loadProjectInputs(project.id, document)
  const problems = await checkJobInPool({ kind: body.kind, document, ...inputs })
  if (problems.length) {
    throw createError({ statusCode: 422, message: `This network cannot be sent for a ${body.kind === 'tolerance' ? 'tolerance run' : 'optimisation'}: ${problems.slice(0, 5).join('; ')}` })
  }
  const unfinished = await Job.count({ where: { projectId: project.id, state: ['queued', 'running'] } })
  if (unfinished >= MAX_UNFINISHED_PER_PROJECT) {
    throw createError({ statusCode: 429, message: `This project already has ${unfinished} runs waiting or running on the server; wait for one to finish or cancel one.` })
  }
  const parameters: JobParameters = body.kind === 'tolerance'
    ? { kind: 'tolerance', trials: body.trials, seed: body.seed, chunkTrials: JOB_CHUNK_TRIALS }
    : { kind: 'optimize', seed: body.seed, maxEvaluations: body.maxEvaluations }
  const chunkCount = parameters.kind === 'tolerance' ? Math.ceil(parameters.trials / parameters.chunkTrials) : 1
  const job = await Job.create({
    projectId: project.id, networkId: network.id, ownerId: user.id, kind: body.kind, parameters, document,
    chunkCount, progressTotal: parameters.kind === 'tolerance' ? parameters.trials : 1,
  })
  try {
    await enqueueJob(job.id)
  } catch {
    await job.update({ state: 'failed', error: 'The server could not queue the run; try again in a moment.', finishedAt: new Date() })
    throw createError({ statusCode: 503, message: 'The server could not queue the run; try again in a moment.' })
  }
  setResponseStatus(event, 201)
  return toJobDto(job)
})
