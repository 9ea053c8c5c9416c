/**
 * What a run needs from its project besides the document: the project's networks by id and name (subnetwork
 * blocks) and the texts of the data files that the document or those networks name. Relative imports only:
 * the queue worker loads this outside Nuxt.
 */
import { Network, StoredFile } from '../database/models'
import { dataFileNames } from '../../shared/network/data-file-names'

export interface ProjectInputs {
  /** Network documents by id and by name (the first of a name wins). */
  networks: Array<[string, unknown]>
  /** Touchstone texts by file name (stored as latin1), only the files some data block names. */
  files: Array<[string, string]>
}

/** Loads the networks and the named data files of a project, as the server's own solves see them. */
export async function loadProjectInputs(projectId: string, document: unknown): Promise<ProjectInputs> {
  const rows = await Network.findAll({ where: { projectId }, attributes: ['id', 'name', 'document'], order: [['createdAt', 'ASC']] })
  const byRef = new Map<string, unknown>()
  for (const n of rows) {
    byRef.set(n.id, n.document)
    if (!byRef.has(n.name)) byRef.set(n.name, n.document)
  }
  const named = dataFileNames([document, ...rows.map(n => n.document)])
  const stored = named.length ? await StoredFile.findAll({ where: { projectId, name: named }, attributes: ['name', 'data'] }) : []
  return { networks: [...byRef], files: stored.map(f => [f.name, f.data.toString('latin1')]) }
}
