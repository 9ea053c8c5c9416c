/** One network with its document, for any member. */
export default defineEventHandler(async (event) => {
  const { project, role } = await requireProjectRole(event, 'viewer')
  const network = await requireNetwork(event, project.id)
  return toNetworkDto(network, role)
})
