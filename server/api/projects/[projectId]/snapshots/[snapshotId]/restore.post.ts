import { restoreSnapshotSchema } from '#shared/schemas/review'
import { Network, Snapshot } from '~~/server/database/models'
import type { RestoreResultDto } from '#shared/types/review'
import type { NetworkDocument } from '#shared/network/types'

/**
 * Makes a snapshot's document the live network again (owners and editors). Like a save it
 * carries the revision the caller has seen, so newer work is never overwritten (409). What
 * it replaces is first frozen as a snapshot of its own, so a restore can itself be undone
 * by restoring that one. History keeps a checkpoint of both.
 */
export default defineEventHandler(async (event): Promise<RestoreResultDto> => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const body = await readBodyAs(event, restoreSnapshotSchema)
  const { snapshot, network } = await requireSnapshot(event, project.id)
  // Co-editors' latest changes wait in the live log: fold them in first, so the revision check and the copy kept
  // of what is replaced see them, and so the restored document is not merged over by older live work.
  await requireMergedLiveState(network.id)
  type Outcome = { stale: number | null } | { kept: Snapshot; revision: number; document: NetworkDocument }
  const outcome = await useDatabase().transaction(async (transaction): Promise<Outcome> => {
    const live = await Network.findByPk(network.id, { transaction, lock: transaction.LOCK.UPDATE })
    if (!live || live.revision !== body.revision) return { stale: live?.revision ?? null }
    // What is replaced is frozen like any snapshot: with its inner networks and data files as they are now.
    const parts = await gatherSnapshotParts(project.id, live.document, transaction)
    const kept = await Snapshot.create({
      networkId: live.id,
      title: `Before restoring “${snapshot.title}”`.slice(0, 200),
      note: `Kept automatically when revision ${live.revision} was replaced by the snapshot “${snapshot.title}”.`,
      document: live.document,
      summary: await summariseWithParts(live.document, parts) as unknown as Record<string, unknown>,
      networkRevision: live.revision,
      networks: frozenNetworksColumn(parts),
      createdBy: user.id,
    }, { transaction })
    await storeSnapshotFiles(kept.id, parts, transaction)
    // The name stays the network's: a snapshot of an older name should not rename it.
    const document = { ...snapshot.document, name: live.document.name ?? live.name }
    const replacedBy = live.updatedBy
    await live.update({ document, revision: live.revision + 1, updatedBy: user.id }, { transaction })
    // Open live editors take the restored document in as an update, in the same transaction as the restore.
    await liveDocumentSaved(network.id, document, user.id, transaction)
    await withoutRisk(transaction, `network ${network.id} after a snapshot restore`, t => checkpointWrite({
      networkId: network.id,
      replaced: { document: kept.document, revision: kept.networkRevision, updatedBy: replacedBy },
      written: { document, revision: live.revision, reason: 'snapshot-restore', by: user.id },
    }, t))
    return { kept, revision: live.revision, document }
  })
  if (!('kept' in outcome)) {
    throw createError({
      statusCode: 409,
      message: `Someone saved a newer version (revision ${outcome.stale}); you had revision ${body.revision}. Reload and restore again if you still want to.`,
      data: { revision: outcome.stale },
    })
  }
  await recordAudit('snapshot.restored', user.id, project.id, {
    snapshotId: snapshot.id, title: snapshot.title, networkId: network.id, revision: outcome.revision, keptAsSnapshotId: outcome.kept.id,
  })
  return { networkId: network.id, revision: outcome.revision, keptAsSnapshotId: outcome.kept.id }
})
