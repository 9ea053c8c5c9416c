import { updateNetworkSchema } from '#shared/schemas/network'
import { Network } from '~~/server/database/models'
import { followNetworkRename } from '~~/server/live/follow-rename'

/**
 * Replaces the document (owners and editors). The caller sends the revision its
 * edit was based on; a stale revision answers 409 and stores nothing. Every
 * save is a history checkpoint. A new name is followed by the project's networks
 * that use this one as a sub-network under its old name.
 */
export default defineEventHandler(async (event) => {
  const { user, project, role } = await requireProjectRole(event, 'editor')
  const existing = await requireNetwork(event, project.id)
  const body = await readBodyAs(event, updateNetworkSchema)
  const document = requireValidDocument(body.document)
  // One conditional UPDATE: the revision check and the write cannot be split by another writer. The live log's
  // entry for the save (open editors take it in instead of overwriting it later) commits with it or not at all.
  const [count, rows] = await useDatabase().transaction(async (transaction) => {
    const result = await Network.update(
      { document, name: document.name?.trim() || existing.name, revision: body.revision + 1, updatedBy: user.id },
      { where: { id: existing.id, revision: body.revision }, returning: true, transaction },
    )
    if (result[0] > 0) {
      await liveDocumentSaved(existing.id, document, user.id, transaction)
      // A rename: the project's networks that use this one as a sub-network by its old name follow it.
      const renamed = result[1][0]!.name
      if (renamed !== existing.name) {
        await withoutRisk(transaction, `networks using ${existing.id} after a rename`, t => followNetworkRename({
          projectId: project.id, networkId: existing.id, from: existing.name, to: renamed, userId: user.id,
        }, t))
      }
      // History: every save is a checkpoint; what it replaced is kept too when no checkpoint holds it yet.
      await withoutRisk(transaction, `network ${existing.id} after a save`, t => checkpointWrite({
        networkId: existing.id,
        replaced: existing.revision === body.revision ? { document: existing.document, revision: existing.revision, updatedBy: existing.updatedBy } : null,
        written: { document, revision: body.revision + 1, reason: 'save', by: user.id },
      }, t))
    }
    return result
  })
  if (count === 0) {
    const current = await Network.findByPk(existing.id)
    throw createError({
      statusCode: 409,
      message: `Someone saved a newer version (revision ${current?.revision}); yours was based on revision ${body.revision}.`,
      data: { revision: current?.revision },
    })
  }
  return toNetworkDto(rows[0]!, role)
})
