/** Deletes a network and its snapshots (owners and editors). */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const network = await requireNetwork(event, project.id)
  await network.destroy()
  await recordAudit('network.deleted', user.id, project.id, { networkId: network.id, name: network.name })
  return { deleted: true }
})
