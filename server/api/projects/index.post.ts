import { createProjectSchema } from '#shared/schemas/project'
import { Membership, Project } from '~~/server/database/models'

/** Creates a project; its creator becomes the owner. */
export default defineEventHandler(async (event) => {
  const user = await requireCurrentUser(event)
  const body = await readBodyAs(event, createProjectSchema)
  const project = await useDatabase().transaction(async (transaction) => {
    const created = await Project.create({ name: body.name, description: body.description, createdBy: user.id }, { transaction })
    await Membership.create({ projectId: created.id, userId: user.id, role: 'owner' }, { transaction })
    return created
  })
  await recordAudit('project.created', user.id, project.id, { name: project.name })
  setResponseStatus(event, 201)
  return toProjectDto(project, 'owner')
})
