import { Job } from '~~/server/database/models'
import type { JobDto } from '#shared/types/jobs'

/** The network's runs on the server, newest first (any member). */
export default defineEventHandler(async (event): Promise<JobDto[]> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const network = await requireNetwork(event, project.id)
  const jobs = await Job.findAll({ where: { networkId: network.id }, attributes: { exclude: ['document'] }, order: [['createdAt', 'DESC']], limit: 50 })
  return jobs.map(toJobDto)
})
