import { Membership, Project } from '~~/server/database/models'

/** The caller's projects with their role in each. */
export default defineEventHandler(async (event) => {
  const user = await requireCurrentUser(event)
  const memberships = await Membership.findAll({ where: { userId: user.id } })
  const projects = await Project.findAll({ where: { id: memberships.map(m => m.projectId) }, order: [['name', 'ASC']] })
  const roleOf = new Map(memberships.map(m => [m.projectId, m.role]))
  return projects.map(p => toProjectDto(p, roleOf.get(p.id)!))
})
