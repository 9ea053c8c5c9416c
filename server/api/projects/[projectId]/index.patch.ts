import { updateProjectSchema } from '#shared/schemas/project'

/** Renames a project or changes its description (owners). */
export default defineEventHandler(async (event) => {
  const { user, project, role } = await requireProjectRole(event, 'owner')
  const body = await readBodyAs(event, updateProjectSchema)
  const before = project.name
  await project.update(body)
  await recordAudit('project.updated', user.id, project.id, { from: before, to: project.name })
  return toProjectDto(project, role)
})
