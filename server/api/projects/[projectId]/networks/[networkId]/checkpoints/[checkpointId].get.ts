import type { CheckpointDto } from '#shared/types/history'

/** One checkpoint with its document (any member). */
export default defineEventHandler(async (event): Promise<CheckpointDto> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const network = await requireNetwork(event, project.id)
  const checkpoint = await requireCheckpoint(event, network)
  const [item] = await toCheckpointItems([checkpoint])
  return { ...item!, document: checkpoint.document }
})
