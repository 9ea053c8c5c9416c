import type { Transaction } from 'sequelize'
import { Network, SnapshotFile, StoredFile, type Snapshot } from '~~/server/database/models'
import type { NetworkDocument } from '#shared/network/types'
import type { StoredFileSummary } from '#shared/types/api'
import type { FrozenPartsDto, SnapshotSummary } from '#shared/types/review'
import { dataFileReferences, subnetworkReferences } from '#shared/network/external-refs'
import { summariseInPool } from './solve-pool'

/** One data file as a snapshot keeps it: the bytes and the version they were. */
export interface FrozenFile {
  name: string
  fileId: string | null
  version: number
  summary: StoredFileSummary
  data: Buffer
}

/** Everything a document uses from its project: inner networks by reference (transitively) and the data files they all read. */
export interface SnapshotParts {
  networks: Array<[string, NetworkDocument]>
  files: FrozenFile[]
}

/**
 * Collects, as they are now, the networks a document uses as sub-networks (and those they use in
 * turn, each reference once) and the data files that it and they read. References resolve as the
 * solver's callers do: by id, else the oldest network of that name. A reference to nothing is left
 * out, so the solve names it as missing, as it would live.
 */
export async function gatherSnapshotParts(projectId: string, document: NetworkDocument, transaction?: Transaction): Promise<SnapshotParts> {
  const rows = await Network.findAll({ where: { projectId }, attributes: ['id', 'name', 'document'], order: [['createdAt', 'ASC']], transaction })
  const byId = new Map(rows.map(n => [n.id, n]))
  const byName = new Map<string, Network>()
  for (const n of rows) if (!byName.has(n.name)) byName.set(n.name, n)
  const networks = new Map<string, NetworkDocument>()
  const queue = subnetworkReferences(document)
  while (queue.length) {
    const ref = queue.shift()!
    if (networks.has(ref)) continue
    const found = byId.get(ref) ?? byName.get(ref)
    if (!found) continue
    networks.set(ref, found.document)
    queue.push(...subnetworkReferences(found.document).filter(r => !networks.has(r)))
  }
  const names = dataFileReferences([document, ...networks.values()])
  const stored = names.length
    ? await StoredFile.findAll({ where: { projectId, name: names }, attributes: ['id', 'name', 'version', 'summary', 'data'], order: [['createdAt', 'ASC']], transaction })
    : []
  const files = new Map<string, FrozenFile>()
  for (const f of stored) if (!files.has(f.name)) files.set(f.name, { name: f.name, fileId: f.id, version: f.version, summary: f.summary, data: f.data })
  return { networks: [...networks], files: [...files.values()] }
}

/** The snapshot summary of a document solved with exactly these parts (in the worker pool, within its budget). */
export function summariseWithParts(document: NetworkDocument, parts: SnapshotParts): Promise<SnapshotSummary> {
  return summariseInPool({ document, networks: parts.networks, files: parts.files.map(f => [f.name, f.data.toString('latin1')]) })
}

/** Stores a new snapshot's copies of its data files (its inner networks go in its own row). */
export async function storeSnapshotFiles(snapshotId: string, parts: SnapshotParts, transaction?: Transaction): Promise<void> {
  if (!parts.files.length) return
  await SnapshotFile.bulkCreate(parts.files.map(f => ({ snapshotId, name: f.name, fileId: f.fileId, version: f.version, summary: f.summary, data: f.data })), { transaction })
}

/** The column value that marks a snapshot as frozen with its parts (an empty list still counts). */
export function frozenNetworksColumn(parts: SnapshotParts): { pairs: Array<[string, NetworkDocument]> } {
  return { pairs: parts.networks }
}

/** The inner networks a snapshot froze, or null for a snapshot made before snapshots froze them. */
export function frozenNetworks(snapshot: Snapshot): Array<[string, NetworkDocument]> | null {
  const column = snapshot.networks
  return column && Array.isArray(column.pairs) ? column.pairs : null
}

/** What a snapshot froze, for pages that show or solve it; null when it froze nothing (an older snapshot). */
export async function frozenPartsDto(snapshot: Snapshot): Promise<FrozenPartsDto | null> {
  const networks = frozenNetworks(snapshot)
  if (!networks) return null
  const files = await SnapshotFile.findAll({ where: { snapshotId: snapshot.id }, attributes: ['name', 'fileId', 'version', 'summary'], order: [['name', 'ASC']] })
  return { networks, files: files.map(f => ({ name: f.name, fileId: f.fileId, version: f.version, summary: f.summary })) }
}

/** The live project's parts of a document in the same shape, for comparing a snapshot with the live network. */
export function livePartsDto(parts: SnapshotParts): FrozenPartsDto {
  return { networks: parts.networks, files: parts.files.map(f => ({ name: f.name, fileId: f.fileId, version: f.version, summary: f.summary })) }
}
