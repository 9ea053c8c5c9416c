import type { H3Event } from 'h3'
import { z } from 'zod'
import { Job } from '~~/server/database/models'
import type { Network } from '~~/server/database/models'

const jobParams = z.object({ jobId: z.uuid() })

/** The job named in the route, if it belongs to the network; 404 otherwise (never saying which). */
export async function requireJob(event: H3Event, network: Network): Promise<Job> {
  const { jobId } = paramsAs(event, jobParams)
  const job = await Job.findOne({ where: { id: jobId, networkId: network.id }, attributes: { exclude: ['document'] } })
  if (!job) throw createError({ statusCode: 404, message: 'That run was not found on this network.' })
  return job
}
