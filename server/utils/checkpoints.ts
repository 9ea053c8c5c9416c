/**
 * Writing a network's history checkpoints. Every writer of `networks.document`
 * calls in here inside its own transaction: the API save, the restores and the
 * live merge (server/live/store.ts). Plain SQL, so the live store can use it too.
 */
import { randomUUID } from 'node:crypto'
import { QueryTypes, type Transaction } from 'sequelize'
import type { NetworkDocument } from '#shared/network/types'
import type { CheckpointReason } from '#shared/types/history'
import { CHECKPOINT_INTERVAL_MS, checkpointsToPrune } from '#shared/history/checkpoint-retention'
import { useDatabase } from './database'

/**
 * Runs history work inside a savepoint of the writer's transaction: history that fails (a full disk, a bug) is
 * logged and rolled back alone, and never undoes the save, restore or merge it belongs to.
 */
export async function withoutRisk<T>(transaction: Transaction, what: string, work: (t: Transaction) => Promise<T>): Promise<T | null> {
  try {
    return await useDatabase().transaction({ transaction }, work)
  } catch (error) {
    console.warn(`[history] ${what}: no checkpoint written (${(error as Error).message})`)
    return null
  }
}

export interface CheckpointInput {
  networkId: string
  document: NetworkDocument
  revision: number
  reason: CheckpointReason
  editorIds: ReadonlyArray<string | null | undefined>
}

export interface NewestCheckpoint {
  id: string
  ageMs: number
  /** Whether its document equals the one asked about. */
  same: boolean
}

/** The network's newest checkpoint, its age and whether it holds `document`; null when it has none. */
export async function newestCheckpoint(networkId: string, document: NetworkDocument, transaction?: Transaction): Promise<NewestCheckpoint | null> {
  const rows = await useDatabase().query<{ id: string, age_ms: number, same: boolean }>(
    `SELECT id, (EXTRACT(EPOCH FROM (now() - created_at)) * 1000)::float8 AS age_ms, document = $2::jsonb AS same
       FROM network_checkpoints WHERE network_id = $1 ORDER BY created_at DESC LIMIT 1`,
    { bind: [networkId, JSON.stringify(document)], type: QueryTypes.SELECT, transaction },
  )
  return rows.length ? { id: rows[0]!.id, ageMs: Number(rows[0]!.age_ms), same: rows[0]!.same } : null
}

/** Writes one checkpoint and prunes the network's older ones by the retention rule; returns its id. */
export async function recordCheckpoint(input: CheckpointInput, transaction?: Transaction): Promise<string> {
  const id = randomUUID()
  const editors = [...new Set(input.editorIds.filter((e): e is string => !!e))]
  await useDatabase().query(
    `INSERT INTO network_checkpoints (id, network_id, document, revision, reason, editor_ids, block_count, created_at)
     VALUES ($1, $2, $3::jsonb, $4, $5, $6::uuid[], $7, clock_timestamp())`,
    { bind: [id, input.networkId, JSON.stringify(input.document), input.revision, input.reason, editors, input.document.blocks?.length ?? 0], transaction },
  )
  await pruneCheckpoints(input.networkId, transaction)
  return id
}

/**
 * Keeps the document about to be replaced as a checkpoint of its own when the
 * history does not already end with it, so a write never drops work that no
 * checkpoint holds (live edits inside the throttle interval, or a network older
 * than its history). Returns the checkpoint's id, or null when none was needed.
 */
export async function keepReplacedDocument(input: Omit<CheckpointInput, 'reason'>, transaction?: Transaction): Promise<string | null> {
  const newest = await newestCheckpoint(input.networkId, input.document, transaction)
  if (newest?.same) return null
  return recordCheckpoint({ ...input, reason: 'before-change' }, transaction)
}

/** Deletes the checkpoints retention no longer keeps (see shared/history/checkpoint-retention.ts). */
export async function pruneCheckpoints(networkId: string, transaction?: Transaction, now = new Date()): Promise<number> {
  const db = useDatabase()
  const rows = await db.query<{ id: string, created_at: Date }>(
    'SELECT id, created_at FROM network_checkpoints WHERE network_id = $1',
    { bind: [networkId], type: QueryTypes.SELECT, transaction },
  )
  const drop = checkpointsToPrune(rows.map(r => ({ id: r.id, createdAt: new Date(r.created_at) })), now)
  if (drop.length) await db.query('DELETE FROM network_checkpoints WHERE id = ANY($1::uuid[])', { bind: [drop], transaction })
  return drop.length
}

/** Members whose live updates were merged since the network's newest checkpoint (plain read: no lock is taken). */
export async function pendingLiveEditors(networkId: string, transaction?: Transaction): Promise<string[]> {
  const rows = await useDatabase().query<{ editors: string[] }>(
    'SELECT editors_since_checkpoint AS editors FROM network_live_states WHERE network_id = $1',
    { bind: [networkId], type: QueryTypes.SELECT, transaction },
  )
  return rows[0]?.editors ?? []
}

export interface MergeCheckpointInput {
  networkId: string
  /** The document and revision as the merge leaves them. */
  document: NetworkDocument
  revision: number
  /** The document the merge replaced, when it changed it. */
  replaced: { document: NetworkDocument, revision: number, updatedBy: string | null } | null
  /** Authors of the updates this merge folded in. */
  authors: string[]
  /** The last editor left (or the server stops): checkpoint now, whatever the interval. */
  final: boolean
}

/**
 * The live merge's part of history, inside the merge's transaction (which holds
 * the live state's row lock). Authors pile up in `editors_since_checkpoint`
 * until a checkpoint is due: when the interval has passed since the newest one
 * (at most one per interval while edits arrive) or the session ends. A due merge
 * keeps the document as it stood before this merge when earlier edits are still
 * unrecorded (so the end of a burst of edits followed by a pause is kept),
 * otherwise the merged one. A network without history first keeps the document
 * it had before its first merged change.
 */
export async function checkpointAfterMerge(input: MergeCheckpointInput, transaction: Transaction): Promise<string | null> {
  const db = useDatabase()
  const setPending = (editors: string[]) => db.query(
    'UPDATE network_live_states SET editors_since_checkpoint = $2::uuid[] WHERE network_id = $1',
    { bind: [input.networkId, editors], transaction },
  )
  const newest = await newestCheckpoint(input.networkId, input.document, transaction)
  if (newest?.same) {
    // The history already ends with this document (an API save or a restore wrote it): nothing is pending.
    await setPending([])
    return null
  }
  if (!input.authors.length && !input.final) return null
  const pendingBefore = await pendingLiveEditors(input.networkId, transaction)
  const all = [...new Set([...pendingBefore, ...input.authors])]
  // Nobody edited live since the newest checkpoint: whatever differs came another way and was kept there.
  if (!all.length) return null
  const due = input.final || !newest || newest.ageMs >= CHECKPOINT_INTERVAL_MS
  if (!due) {
    await setPending(all)
    return null
  }
  const current = { networkId: input.networkId, document: input.document, revision: input.revision }
  if (!newest && input.replaced) {
    await recordCheckpoint({ networkId: input.networkId, document: input.replaced.document, revision: input.replaced.revision, reason: 'before-change', editorIds: [input.replaced.updatedBy] }, transaction)
  }
  if (!input.final && newest && pendingBefore.length && input.replaced) {
    const id = await recordCheckpoint({ networkId: input.networkId, document: input.replaced.document, revision: input.replaced.revision, reason: 'editing', editorIds: pendingBefore }, transaction)
    await setPending([...new Set(input.authors)])
    return id
  }
  const id = await recordCheckpoint({ ...current, reason: input.final ? 'session-end' : 'editing', editorIds: all }, transaction)
  await setPending([])
  return id
}

/**
 * History of one write through the API (a save or a restore), inside its transaction: the replaced document
 * first when the history does not end with it, then the written one. Returns both ids (the first may be null).
 */
export async function checkpointWrite(input: {
  networkId: string
  replaced: { document: NetworkDocument, revision: number, updatedBy: string | null } | null
  written: { document: NetworkDocument, revision: number, reason: CheckpointReason, by: string }
}, transaction: Transaction): Promise<{ keptId: string | null, id: string }> {
  let keptId: string | null = null
  if (input.replaced) {
    const editors = await pendingLiveEditors(input.networkId, transaction)
    keptId = await keepReplacedDocument({
      networkId: input.networkId, document: input.replaced.document, revision: input.replaced.revision,
      editorIds: editors.length ? editors : [input.replaced.updatedBy],
    }, transaction)
  }
  const id = await recordCheckpoint({
    networkId: input.networkId, document: input.written.document, revision: input.written.revision, reason: input.written.reason, editorIds: [input.written.by],
  }, transaction)
  return { keptId, id }
}
