import { compareQuerySchema } from '#shared/schemas/review'
import { diffDocuments } from '#shared/review/document-diff'
import { Network, Snapshot } from '~~/server/database/models'
import type { CompareDto, CompareSideDto } from '#shared/types/review'

const when = (date: Date) => date.toISOString().slice(0, 16).replace('T', ' ')

/**
 * Compares this snapshot (before) with another snapshot of the same network or with the
 * live network (after): the change table and both documents, for the overlaid plots, each with
 * the inner networks and data files it is solved with (a snapshot's frozen ones, the live ones now).
 */
export default defineEventHandler(async (event): Promise<CompareDto> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const query = queryAs(event, compareQuerySchema)
  const { snapshot, network } = await requireSnapshot(event, project.id)
  const before: CompareSideDto = { kind: 'snapshot', id: snapshot.id, label: `${snapshot.title} (${when(snapshot.createdAt)})`, document: snapshot.document, parts: await frozenPartsDto(snapshot) }
  let after: CompareSideDto
  if (query.with === 'live') {
    const live = (await Network.findByPk(network.id))!
    const parts = livePartsDto(await gatherSnapshotParts(project.id, live.document))
    after = { kind: 'live', id: live.id, label: `Live network (revision ${live.revision})`, document: live.document, parts, revision: live.revision }
  } else {
    const other = await Snapshot.findOne({ where: { id: query.with, networkId: network.id } })
    if (!other) throw createError({ statusCode: 404, message: 'The snapshot to compare with is not one of this network\'s snapshots.' })
    after = { kind: 'snapshot', id: other.id, label: `${other.title} (${when(other.createdAt)})`, document: other.document, parts: await frozenPartsDto(other) }
  }
  return { before, after, diff: diffDocuments(before.document, after.document) }
})
