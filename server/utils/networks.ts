import type { H3Event } from 'h3'
import { z } from 'zod'
import { Network } from '~~/server/database/models'

const networkParams = z.object({ projectId: z.uuid(), networkId: z.uuid() })

/** Loads a network of the given project from the route; 404 when it is not there. */
export async function requireNetwork(event: H3Event, projectId: string): Promise<Network> {
  const { networkId } = paramsAs(event, networkParams)
  const network = await Network.findOne({ where: { id: networkId, projectId } })
  if (!network) throw createError({ statusCode: 404, message: 'Network not found.' })
  return network
}
