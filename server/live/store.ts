/**
 * PostgreSQL side of live co-editing: the append-only update log, the merged
 * state, the merge that folds one into the other and keeps `networks.document`
 * and `revision` following the Yjs state, and the notifications that carry an
 * update id to the other app instances.
 */
import { QueryTypes, type Transaction } from 'sequelize'
import * as Y from 'yjs'
import { networkToYDoc, writeNetwork } from '#shared/live/network-ydoc'
import { readNetworkStrict } from '#shared/live/strict-read'
import type { NetworkDocument } from '#shared/network/types'
import { useDatabase } from '~~/server/utils/database'
import { checkpointAfterMerge, withoutRisk } from '~~/server/utils/checkpoints'
import { followNetworkRename } from './follow-rename'

/** Channel of "an update was stored": payload `<networkId> <updateId> <instanceId>`. */
export const UPDATE_CHANNEL = 'portwright_live_update'
/** Channel of presence (awareness) between instances: payload `<instanceId> <networkId> <base64>`. */
export const PRESENCE_CHANNEL = 'portwright_live_presence'
/** Channel of "memberships of a project changed": payload is the project id. */
export const ACCESS_CHANNEL = 'portwright_live_access'

export interface StoredUpdate { id: string, data: Uint8Array }

function bytes(value: Buffer | Uint8Array): Uint8Array {
  return new Uint8Array(value.buffer, value.byteOffset, value.byteLength)
}

async function pendingUpdates(networkId: string, transaction?: Transaction): Promise<Array<StoredUpdate & { userId: string | null }>> {
  const rows = await useDatabase().query<{ id: string, data: Buffer, user_id: string | null }>(
    'SELECT id, data, user_id FROM network_updates WHERE network_id = $1 ORDER BY id',
    { bind: [networkId], type: QueryTypes.SELECT, transaction },
  )
  return rows.map(r => ({ id: String(r.id), data: bytes(r.data), userId: r.user_id }))
}

/**
 * The stored state of a network and the updates logged since its last merge.
 * The first time a network goes live its state is made from the JSONB document;
 * the insert is conditional, so when two instances race, both end up with the
 * one state that won (two independent conversions would duplicate every block).
 */
export async function loadLiveState(networkId: string): Promise<{ state: Uint8Array, updates: StoredUpdate[] } | null> {
  const db = useDatabase()
  let rows = await db.query<{ state: Buffer }>('SELECT state FROM network_live_states WHERE network_id = $1', { bind: [networkId], type: QueryTypes.SELECT })
  if (!rows.length) {
    const networks = await db.query<{ document: NetworkDocument }>('SELECT document FROM networks WHERE id = $1', { bind: [networkId], type: QueryTypes.SELECT })
    if (!networks.length) return null
    const initial = Buffer.from(Y.encodeStateAsUpdate(networkToYDoc(networks[0]!.document)))
    await db.query('INSERT INTO network_live_states (network_id, state) VALUES ($1, $2) ON CONFLICT (network_id) DO NOTHING', { bind: [networkId, initial] })
    rows = await db.query<{ state: Buffer }>('SELECT state FROM network_live_states WHERE network_id = $1', { bind: [networkId], type: QueryTypes.SELECT })
    if (!rows.length) return null
  }
  return { state: bytes(rows[0]!.state), updates: await pendingUpdates(networkId) }
}

/**
 * Appends an accepted update and announces its id to every instance, in one
 * statement: the notification goes out when the row is committed, never before.
 */
export async function appendUpdate(networkId: string, data: Uint8Array, userId: string | null, instanceId: string, transaction?: Transaction): Promise<string> {
  const rows = await useDatabase().query<{ id: string }>(
    `WITH stored AS (INSERT INTO network_updates (network_id, data, user_id) VALUES ($1, $2, $3) RETURNING id)
     SELECT id, pg_notify('${UPDATE_CHANNEL}', $4 || ' ' || id || ' ' || $5) FROM stored`,
    { bind: [networkId, Buffer.from(data), userId, networkId, instanceId], type: QueryTypes.SELECT, transaction },
  )
  return String(rows[0]!.id)
}

/** One logged update by id; null once a merge has folded it into the state. */
export async function readUpdate(id: string): Promise<StoredUpdate | null> {
  const rows = await useDatabase().query<{ id: string, data: Buffer }>('SELECT id, data FROM network_updates WHERE id = $1', { bind: [id], type: QueryTypes.SELECT })
  return rows.length ? { id: String(rows[0]!.id), data: bytes(rows[0]!.data) } : null
}

export interface MergeResult {
  /** Log rows folded into the state. */
  merged: number
  /** The network's revision after the merge (bumped only when the JSON document changed). */
  revision: number | null
  /** Whether the merged state failed the contract's structural check (the JSONB document was then left as it was). */
  invalid: boolean
}

/**
 * Folds the update log into the merged state and writes the JSON document and
 * a new revision when the document changed, all in one transaction. The state
 * row is locked, so merges of one network from several instances take turns;
 * only the rows read here are deleted, so an update committed meanwhile stays
 * in the log for the next merge. The merge also keeps the network's history
 * (server/utils/checkpoints.ts); `final` is the last merge of a live session.
 */
export async function mergeLiveState(networkId: string, options: { final?: boolean } = {}): Promise<MergeResult> {
  return useDatabase().transaction(async (transaction) => {
    const db = useDatabase()
    const states = await db.query<{ state: Buffer }>('SELECT state FROM network_live_states WHERE network_id = $1 FOR UPDATE', { bind: [networkId], type: QueryTypes.SELECT, transaction })
    if (!states.length) return { merged: 0, revision: null, invalid: false }
    const updates = await pendingUpdates(networkId, transaction)
    const doc = new Y.Doc()
    Y.applyUpdate(doc, bytes(states[0]!.state))
    for (const u of updates) Y.applyUpdate(doc, u.data)
    const parsed = readNetworkStrict(doc)
    if (!parsed.ok) {
      // Nothing is folded or deleted: the log keeps every update and the JSON document its last valid version.
      doc.destroy()
      console.warn(`[live] network ${networkId}: merged state is not a valid document (${parsed.reason}); the log and the JSON document are kept as they are`)
      return { merged: 0, revision: null, invalid: true }
    }
    if (updates.length) {
      // Re-encoding from a document (not Y.mergeUpdates) drops the content of deleted items, so the state does not grow with history.
      await db.query('UPDATE network_live_states SET state = $2, merged_at = now() WHERE network_id = $1', { bind: [networkId, Buffer.from(Y.encodeStateAsUpdate(doc))], transaction })
      await db.query('DELETE FROM network_updates WHERE id = ANY($1::bigint[])', { bind: [updates.map(u => u.id)], transaction })
    }
    doc.destroy()
    const lastAuthor = [...updates].reverse().find(u => u.userId)?.userId ?? null
    // NO KEY UPDATE, not UPDATE: the log's foreign key takes KEY SHARE on this row, so a plain FOR UPDATE
    // would hold every incoming edit of the network until the merge commits.
    const before = await db.query<{ document: NetworkDocument, revision: number, updated_by: string | null, name: string, project_id: string }>(
      'SELECT document, revision, updated_by, name, project_id FROM networks WHERE id = $1 FOR NO KEY UPDATE', { bind: [networkId], type: QueryTypes.SELECT, transaction },
    )
    const changed = await db.query<{ revision: number }>(
      `UPDATE networks SET document = $2::jsonb, name = COALESCE(NULLIF($3, ''), name), revision = revision + 1,
         updated_by = COALESCE($4, updated_by), updated_at = now()
       WHERE id = $1 AND document IS DISTINCT FROM $2::jsonb RETURNING revision`,
      { bind: [networkId, JSON.stringify(parsed.document), (parsed.document.name ?? '').trim().slice(0, 200), lastAuthor], type: QueryTypes.SELECT, transaction },
    )
    const newName = (parsed.document.name ?? '').trim().slice(0, 200)
    if (changed.length && before.length && newName && newName !== before[0]!.name) {
      // A rename typed in the editor: networks using this one as a sub-network by its old name follow it.
      const by = lastAuthor ?? before[0]!.updated_by
      await withoutRisk(transaction, `networks using ${networkId} after a rename`, t => followNetworkRename({
        projectId: before[0]!.project_id, networkId, from: before[0]!.name, to: newName, userId: by,
      }, t))
    }
    if (before.length) {
      const authors = [...new Set(updates.map(u => u.userId).filter((id): id is string => !!id))]
      await withoutRisk(transaction, `network ${networkId} after a live merge`, t => checkpointAfterMerge({
        networkId,
        document: parsed.document,
        revision: changed[0]?.revision ?? before[0]!.revision,
        replaced: changed.length ? { document: before[0]!.document, revision: before[0]!.revision, updatedBy: before[0]!.updated_by } : null,
        authors,
        final: options.final ?? false,
      }, t))
    }
    return { merged: updates.length, revision: changed[0]?.revision ?? null, invalid: false }
  })
}

/**
 * A document saved through the REST API while the network is live becomes a
 * Yjs update of its own (only the differences), logged and announced like any
 * other, so live clients take it in instead of overwriting it. Does nothing for
 * a network that has never been opened live.
 */
export async function applyDocumentToLiveState(networkId: string, document: NetworkDocument, userId: string | null, instanceId: string, transaction?: Transaction): Promise<boolean> {
  const db = useDatabase()
  const states = await db.query<{ state: Buffer }>('SELECT state FROM network_live_states WHERE network_id = $1', { bind: [networkId], type: QueryTypes.SELECT, transaction })
  if (!states.length) return false
  const doc = new Y.Doc()
  Y.applyUpdate(doc, bytes(states[0]!.state))
  for (const u of await pendingUpdates(networkId, transaction)) Y.applyUpdate(doc, u.data)
  const before = Y.encodeStateVector(doc)
  doc.transact(() => writeNetwork(doc, document))
  const diff = Y.encodeStateAsUpdate(doc, before)
  doc.destroy()
  // An update with no new items and no deletions is two zero bytes: nothing to log.
  if (diff.length <= 2) return false
  await appendUpdate(networkId, diff, userId, instanceId, transaction)
  return true
}

/**
 * Applies an edit made on the server (not by an editor) to a network's live state as one logged update:
 * the edit sees the live document (merged state plus the log, so co-editors' newest work is kept) and only
 * what it changes is written. Does nothing for a network never opened live or whose live state does not
 * read as a document; false then and when the edit changes nothing.
 */
export async function editLiveState(networkId: string, edit: (document: NetworkDocument) => NetworkDocument, userId: string | null, instanceId: string, transaction?: Transaction): Promise<boolean> {
  const db = useDatabase()
  const states = await db.query<{ state: Buffer }>('SELECT state FROM network_live_states WHERE network_id = $1', { bind: [networkId], type: QueryTypes.SELECT, transaction })
  if (!states.length) return false
  const doc = new Y.Doc()
  Y.applyUpdate(doc, bytes(states[0]!.state))
  for (const u of await pendingUpdates(networkId, transaction)) Y.applyUpdate(doc, u.data)
  const parsed = readNetworkStrict(doc)
  if (!parsed.ok) { doc.destroy(); return false }
  const before = Y.encodeStateVector(doc)
  doc.transact(() => writeNetwork(doc, edit(parsed.document)))
  const diff = Y.encodeStateAsUpdate(doc, before)
  doc.destroy()
  if (diff.length <= 2) return false
  await appendUpdate(networkId, diff, userId, instanceId, transaction)
  return true
}

/** Announces that a project's memberships changed, so every instance re-checks its live connections now. */
export async function notifyAccessChanged(projectId: string): Promise<void> {
  await useDatabase().query(`SELECT pg_notify('${ACCESS_CHANNEL}', $1)`, { bind: [projectId], type: QueryTypes.SELECT })
}

/** Publishes a presence update to the other instances; false when it is too big for a notification. */
export async function publishPresence(instanceId: string, networkId: string, update: Uint8Array): Promise<boolean> {
  const payload = `${instanceId} ${networkId} ${Buffer.from(update).toString('base64')}`
  // PostgreSQL refuses notification payloads of 8000 bytes or more.
  if (payload.length >= 7900) return false
  await useDatabase().query(`SELECT pg_notify('${PRESENCE_CHANNEL}', $1)`, { bind: [payload], type: QueryTypes.SELECT })
  return true
}

export interface LiveGrant { projectId: string, role: string, sessionVersion: number }

/** A user's role in the project of a network, with their current session version; null when not a member or no such network. */
export async function networkMembership(networkId: string, userId: string): Promise<LiveGrant | null> {
  const rows = await useDatabase().query<{ project_id: string, role: string, session_version: number }>(
    `SELECT n.project_id, m.role, u.session_version FROM networks n
       JOIN memberships m ON m.project_id = n.project_id AND m.user_id = $2
       JOIN users u ON u.id = m.user_id
     WHERE n.id = $1`,
    { bind: [networkId, userId], type: QueryTypes.SELECT },
  )
  return rows.length ? { projectId: rows[0]!.project_id, role: rows[0]!.role, sessionVersion: rows[0]!.session_version } : null
}

/** Which of these session rows still let their holder in (not revoked): the periodic re-check of live connections. */
export async function liveSessionIds(ids: string[]): Promise<Set<string>> {
  if (!ids.length) return new Set()
  const rows = await useDatabase().query<{ id: string }>(
    'SELECT id FROM sessions WHERE id = ANY($1::uuid[]) AND revoked_at IS NULL',
    { bind: [ids], type: QueryTypes.SELECT },
  )
  return new Set(rows.map(r => r.id))
}

/** Current roles (and session versions) for many (network, user) pairs at once: the periodic re-check. */
export async function currentMemberships(pairs: Array<{ networkId: string, userId: string }>): Promise<Map<string, { role: string, sessionVersion: number }>> {
  const out = new Map<string, { role: string, sessionVersion: number }>()
  if (!pairs.length) return out
  const rows = await useDatabase().query<{ network_id: string, user_id: string, role: string, session_version: number }>(
    `SELECT n.id AS network_id, m.user_id, m.role, u.session_version
       FROM unnest($1::uuid[], $2::uuid[]) AS p(network_id, user_id)
       JOIN networks n ON n.id = p.network_id
       JOIN memberships m ON m.project_id = n.project_id AND m.user_id = p.user_id
       JOIN users u ON u.id = m.user_id`,
    { bind: [pairs.map(p => p.networkId), pairs.map(p => p.userId)], type: QueryTypes.SELECT },
  )
  for (const r of rows) out.set(`${r.network_id} ${r.user_id}`, { role: r.role, sessionVersion: r.session_version })
  return out
}
