import type { H3Event } from 'h3'
import { z } from 'zod'
import { NetworkCheckpoint, type Network } from '~~/server/database/models'
import type { CheckpointListItemDto } from '#shared/types/history'
import { peopleById } from './review'

/** Loads a checkpoint of the given network from the route's `checkpointId`; 404 when it is not there. */
export async function requireCheckpoint(event: H3Event, network: Network): Promise<NetworkCheckpoint> {
  const { checkpointId } = paramsAs(event, z.object({ checkpointId: z.uuid() }))
  const checkpoint = await NetworkCheckpoint.findOne({ where: { id: checkpointId, networkId: network.id } })
  if (!checkpoint) throw createError({ statusCode: 404, message: 'Checkpoint not found; it may have been thinned out by the history\'s retention.' })
  return checkpoint
}

/** Checkpoints as list entries, with the people who edited. */
export async function toCheckpointItems(checkpoints: NetworkCheckpoint[]): Promise<CheckpointListItemDto[]> {
  const people = await peopleById(checkpoints.flatMap(c => c.editorIds ?? []))
  return checkpoints.map(c => ({
    id: c.id,
    networkId: c.networkId,
    createdAt: c.createdAt.toISOString(),
    revision: c.revision,
    reason: c.reason,
    editors: (c.editorIds ?? []).map(id => people.get(id)).filter((p): p is NonNullable<typeof p> => !!p),
    blockCount: c.blockCount,
  }))
}
