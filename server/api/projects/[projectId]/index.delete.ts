/** Deletes a project with its networks and snapshots (owners). */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'owner')
  await project.destroy()
  await recordAudit('project.deleted', user.id, null, { projectId: project.id, name: project.name })
  return { deleted: true }
})
