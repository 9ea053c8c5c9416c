import { createNetworkSchema } from '#shared/schemas/network'
import { Network } from '~~/server/database/models'

/** Creates a network, empty or from a given document (owners and editors). */
export default defineEventHandler(async (event) => {
  const { user, project, role } = await requireProjectRole(event, 'editor')
  const body = await readBodyAs(event, createNetworkSchema)
  const document = body.document === undefined
    ? emptyNetworkDocument(body.name)
    : { ...requireValidDocument(body.document), name: body.name }
  const network = await Network.create({ projectId: project.id, name: body.name, document, updatedBy: user.id })
  await recordAudit('network.created', user.id, project.id, { networkId: network.id, name: network.name })
  setResponseStatus(event, 201)
  return toNetworkDto(network, role)
})
