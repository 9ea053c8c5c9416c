/** Deletes a board from the project's substrate library (owners and editors); networks keep their copies. */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const substrate = await requireLibrarySubstrate(event, project.id)
  await substrate.destroy()
  await recordAudit('substrate.deleted', user.id, project.id, { substrateId: substrate.id, name: substrate.name })
  return { deleted: true }
})
