import { restoreCheckpointSchema } from '#shared/schemas/history'
import { Network } from '~~/server/database/models'
import type { CheckpointRestoreResultDto } from '#shared/types/history'
import type { NetworkDocument } from '#shared/network/types'

/**
 * Makes a checkpoint's document the live network again, as a new change (owners and editors).
 * It carries the revision the caller has seen, so newer work is never overwritten (409); what
 * it replaces is kept as a checkpoint of its own, and open live editors take the result in.
 */
export default defineEventHandler(async (event): Promise<CheckpointRestoreResultDto> => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const body = await readBodyAs(event, restoreCheckpointSchema)
  const network = await requireNetwork(event, project.id)
  const checkpoint = await requireCheckpoint(event, network)
  // Co-editors' latest changes wait in the live log: fold them in first, so the revision check and the
  // checkpoint kept of what is replaced see them, and the restored document is not merged over by older work.
  await requireMergedLiveState(network.id)
  type Outcome = { stale: number | null } | { revision: number; keptId: string | null; document: NetworkDocument }
  const outcome = await useDatabase().transaction(async (transaction): Promise<Outcome> => {
    const live = await Network.findByPk(network.id, { transaction, lock: transaction.LOCK.UPDATE })
    if (!live || live.revision !== body.revision) return { stale: live?.revision ?? null }
    const replaced = { document: live.document, revision: live.revision, updatedBy: live.updatedBy }
    // The name stays the network's: a checkpoint of an older name should not rename it.
    const document = { ...checkpoint.document, name: live.document.name ?? live.name }
    await live.update({ document, revision: live.revision + 1, updatedBy: user.id }, { transaction })
    await liveDocumentSaved(network.id, document, user.id, transaction)
    const written = await withoutRisk(transaction, `network ${network.id} after a checkpoint restore`, t => checkpointWrite({
      networkId: network.id, replaced, written: { document, revision: live.revision, reason: 'checkpoint-restore', by: user.id },
    }, t))
    return { revision: live.revision, keptId: written?.keptId ?? null, document }
  })
  if (!('document' in outcome)) {
    throw createError({
      statusCode: 409,
      message: `Someone saved a newer version (revision ${outcome.stale}); you had revision ${body.revision}. Reload and restore again if you still want to.`,
      data: { revision: outcome.stale },
    })
  }
  await recordAudit('checkpoint.restored', user.id, project.id, {
    checkpointId: checkpoint.id, checkpointAt: checkpoint.createdAt.toISOString(), networkId: network.id, revision: outcome.revision, keptAsCheckpointId: outcome.keptId,
  })
  return { networkId: network.id, revision: outcome.revision, keptAsCheckpointId: outcome.keptId }
})
