import { Network } from '~~/server/database/models'
import { apiNetworksQuerySchema } from '#shared/schemas/access-token'
import type { AutomationNetworkDto } from '#shared/types/access-token'

/** The networks of one project in the token's scope (id, name, revision, last change), so scripts can find ids. */
export default defineEventHandler(async (event): Promise<AutomationNetworkDto[]> => {
  const access = await requireToken(event)
  const { project } = queryAs(event, apiNetworksQuerySchema)
  await requireTokenProjectRole(access, project, 'viewer')
  const networks = await Network.findAll({ where: { projectId: project }, attributes: ['id', 'name', 'revision', 'updatedAt'], order: [['name', 'ASC']] })
  return networks.map(n => ({ id: n.id, name: n.name, revision: n.revision, updatedAt: n.updatedAt.toISOString() }))
})
