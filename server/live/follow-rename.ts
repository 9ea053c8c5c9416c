/**
 * Sub-network blocks name another network of the project (by name, as the contract's `network`
 * param is usually written). When a network is renamed, the project's other networks that name it
 * by its old name are rewritten to the new one in the same transaction: their JSON document (a new
 * revision with a history checkpoint) and, for networks open in an editor, their live state, as one
 * logged update that every instance hands to its open editors. Nobody's outer network breaks.
 */
import { QueryTypes, type Transaction } from 'sequelize'
import type { NetworkDocument } from '#shared/network/types'
import { useDatabase } from '~~/server/utils/database'
import { checkpointWrite, withoutRisk } from '~~/server/utils/checkpoints'
import { editLiveState } from './store'

/** The same document with every subnetwork block that names `from` naming `to`; the input is not changed. */
export function withSubnetworkReference(document: NetworkDocument, from: string, to: string): NetworkDocument {
  return {
    ...document,
    blocks: (document.blocks ?? []).map(block => (block.type === 'subnetwork' && (block.params as Record<string, unknown> | undefined)?.network === from
      ? { ...block, params: { ...block.params, network: to } }
      : block)),
  }
}

export interface RenameFollowed {
  /** The networks rewritten, by id and name. */
  networks: Array<{ id: string, name: string }>
  /** What their blocks now name: the new name, or the network's id when an older network already has that name. */
  reference: string
}

/**
 * Rewrites the references to a renamed network in the project's other networks (inside the caller's
 * transaction, after the rename is written). Only when the old name pointed at this network (no older
 * network has it): otherwise those blocks meant the other one. When an older network already bears the
 * new name, the blocks get this network's id instead, which resolves to it alone.
 */
export async function followNetworkRename(input: { projectId: string, networkId: string, from: string, to: string, userId: string | null }, transaction: Transaction): Promise<RenameFollowed> {
  const { projectId, networkId, from, to } = input
  const none = { networks: [], reference: to }
  if (!from || from === to) return none
  const db = useDatabase()
  const older = await db.query<{ name: string }>(
    `SELECT o.name FROM networks o, networks n WHERE n.id = $1 AND o.project_id = $2 AND o.id <> n.id AND o.created_at < n.created_at AND o.name IN ($3, $4)`,
    { bind: [networkId, projectId, from, to], type: QueryTypes.SELECT, transaction },
  )
  if (older.some(o => o.name === from)) return none
  const reference = older.some(o => o.name === to) ? networkId : to
  // Candidates by JSON containment, then locked one by one in id order (the lock order of every writer here).
  const using = await db.query<{ id: string }>(
    `SELECT id FROM networks WHERE project_id = $1 AND id <> $2 AND document->'blocks' @> $3::jsonb ORDER BY id`,
    { bind: [projectId, networkId, JSON.stringify([{ type: 'subnetwork', params: { network: from } }])], type: QueryTypes.SELECT, transaction },
  )
  const rewritten: Array<{ id: string, name: string }> = []
  for (const { id } of using) {
    const rows = await db.query<{ name: string, document: NetworkDocument, revision: number, updated_by: string | null }>(
      'SELECT name, document, revision, updated_by FROM networks WHERE id = $1 FOR NO KEY UPDATE', { bind: [id], type: QueryTypes.SELECT, transaction },
    )
    const row = rows[0]
    if (!row) continue
    const document = withSubnetworkReference(row.document, from, reference)
    await db.query(
      'UPDATE networks SET document = $2::jsonb, revision = revision + 1, updated_by = COALESCE($3, updated_by), updated_at = now() WHERE id = $1',
      { bind: [id, JSON.stringify(document), input.userId], type: QueryTypes.UPDATE, transaction },
    )
    // Open editors see the new reference; their own unmerged work is kept (the edit reads the live document).
    await editLiveState(id, live => withSubnetworkReference(live, from, reference), input.userId, 'api', transaction)
    const by = input.userId ?? row.updated_by
    if (by) {
      await withoutRisk(transaction, `network ${id} after following a rename`, t => checkpointWrite({
        networkId: id,
        replaced: { document: row.document, revision: row.revision, updatedBy: row.updated_by },
        written: { document, revision: row.revision + 1, reason: 'save', by },
      }, t))
    }
    rewritten.push({ id, name: row.name })
  }
  return { networks: rewritten, reference }
}
