import { NetworkCheckpoint } from '~~/server/database/models'
import type { CheckpointListItemDto } from '#shared/types/history'

/** A network's history checkpoints, newest first, without their documents (any member). */
export default defineEventHandler(async (event): Promise<CheckpointListItemDto[]> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const network = await requireNetwork(event, project.id)
  const checkpoints = await NetworkCheckpoint.findAll({
    where: { networkId: network.id },
    attributes: { exclude: ['document'] },
    order: [['createdAt', 'DESC']],
    // Retention keeps a few hundred per network at most; the cap only guards against a flood of saves.
    limit: 1000,
  })
  return toCheckpointItems(checkpoints)
})
