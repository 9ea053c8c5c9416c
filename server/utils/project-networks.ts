import { Network } from '~~/server/database/models'

/** A project's network documents by id and by name (the first of a name wins), for resolving subnetworks. */
export async function projectNetworksByRef(projectId: string): Promise<Array<[string, unknown]>> {
  const networks = await Network.findAll({ where: { projectId }, attributes: ['id', 'name', 'document'], order: [['createdAt', 'ASC']] })
  const byRef = new Map<string, unknown>()
  for (const n of networks) {
    byRef.set(n.id, n.document)
    if (!byRef.has(n.name)) byRef.set(n.name, n.document)
  }
  return [...byRef]
}
