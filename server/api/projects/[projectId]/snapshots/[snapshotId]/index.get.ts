import type { SnapshotDto } from '#shared/types/review'

/** One snapshot with its frozen document, inner networks and the list of its data-file copies (any member). */
export default defineEventHandler(async (event): Promise<SnapshotDto> => {
  const { project, role } = await requireProjectRole(event, 'viewer')
  const { snapshot, network } = await requireSnapshot(event, project.id)
  const [item] = await snapshotListItems([snapshot])
  return { ...item!, projectId: project.id, networkName: network.name, document: snapshot.document, frozen: await frozenPartsDto(snapshot), role }
})
