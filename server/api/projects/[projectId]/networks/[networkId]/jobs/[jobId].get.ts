import type { JobDto } from '#shared/types/jobs'

/** One run with its progress and, once done, its answer (any member). */
export default defineEventHandler(async (event): Promise<JobDto> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const network = await requireNetwork(event, project.id)
  return toJobDto(await requireJob(event, network))
})
