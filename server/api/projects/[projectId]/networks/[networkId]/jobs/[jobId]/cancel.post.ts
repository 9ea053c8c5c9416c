import { Job } from '~~/server/database/models'
import { notifyJobChanged } from '~~/server/jobs/progress-channel'
import type { JobDto } from '#shared/types/jobs'

/** Stops a waiting or running run (owners and editors); workers drop its remaining chunks. A finished run is left as it is. */
export default defineEventHandler(async (event): Promise<JobDto> => {
  const { project } = await requireProjectRole(event, 'editor')
  const network = await requireNetwork(event, project.id)
  const job = await requireJob(event, network)
  const [changed] = await Job.update({ state: 'cancelled', finishedAt: new Date() }, { where: { id: job.id, state: ['queued', 'running'] } })
  if (changed) {
    await notifyJobChanged(job.id)
    await dequeueJob(job.id, job.chunkCount)
  }
  await job.reload()
  return toJobDto(job)
})
