import { createSnapshotSchema } from '#shared/schemas/review'
import { Network, Snapshot } from '~~/server/database/models'
import type { SnapshotDto } from '#shared/types/review'

/**
 * Freezes the network as saved now (owners and editors): title, note, the full document,
 * the documents of the networks it uses as sub-networks and copies of the data files they
 * all read, and its solver summary. With `revision`, a network saved since then answers 409, so
 * nobody freezes a version other than the one on their screen. A network that does not
 * solve is frozen all the same, its problem kept in the summary and the audit trail, unless
 * `allowUnsolved: false` asks to be told first (422 naming the problem, nothing stored).
 */
export default defineEventHandler(async (event): Promise<SnapshotDto> => {
  const { user, project, role } = await requireProjectRole(event, 'editor')
  const body = await readBodyAs(event, createSnapshotSchema)
  const found = await requireNetwork(event, project.id)
  // Co-editors' last keystrokes wait in the live update log for the next merge; fold them in now so the snapshot holds them.
  await requireMergedLiveState(found.id)
  const network = (await Network.findByPk(found.id))!
  if (body.revision !== undefined && body.revision !== network.revision) {
    throw createError({
      statusCode: 409,
      message: `The network has changed since revision ${body.revision} (it is now at ${network.revision}); reload it before freezing.`,
      data: { revision: network.revision },
    })
  }
  // The inner networks and data files it uses are frozen with it: later edits to them never change this snapshot.
  const parts = await gatherSnapshotParts(project.id, network.document)
  const summary = await summariseWithParts(network.document, parts)
  if (!summary.solved && !body.allowUnsolved) throw unsolvedRefusal('network', summary.problem)
  const snapshot = await useDatabase().transaction(async (transaction) => {
    const made = await Snapshot.create({
      networkId: network.id,
      title: body.title,
      note: body.note,
      document: network.document,
      summary: summary as unknown as Record<string, unknown>,
      networkRevision: network.revision,
      networks: frozenNetworksColumn(parts),
      createdBy: user.id,
    }, { transaction })
    await storeSnapshotFiles(made.id, parts, transaction)
    return made
  })
  await recordAudit('snapshot.created', user.id, project.id, { snapshotId: snapshot.id, networkId: network.id, title: snapshot.title, revision: network.revision, ...unsolvedDetail(summary) })
  setResponseStatus(event, 201)
  const [item] = await snapshotListItems([snapshot])
  return { ...item!, projectId: project.id, networkName: network.name, document: snapshot.document, frozen: await frozenPartsDto(snapshot), role }
})
