import type { H3Event } from 'h3'
import { z } from 'zod'
import { Membership, Project, type User } from '~~/server/database/models'
import type { ProjectRole } from '#shared/types/api'

const rank: Record<ProjectRole, number> = { viewer: 0, reviewer: 1, editor: 2, owner: 3 }

/** True when `role` carries at least the rights of `needed`. */
export function roleAtLeast(role: ProjectRole, needed: ProjectRole): boolean {
  return rank[role] >= rank[needed]
}

export interface ProjectAccess {
  user: User
  project: Project
  role: ProjectRole
}

const projectParams = z.object({ projectId: z.uuid({ message: 'projectId must be a UUID' }) })

/**
 * The one gate for project routes: checks the session, reads the caller's role in
 * the project from the database, and refuses with 404 (not a member) or 403
 * (member without the needed role).
 */
export async function requireProjectRole(event: H3Event, needed: ProjectRole): Promise<ProjectAccess> {
  const user = await requireCurrentUser(event)
  const { projectId } = paramsAs(event, projectParams)
  const membership = await Membership.findOne({ where: { projectId, userId: user.id } })
  const project = membership && await Project.findByPk(projectId)
  if (!membership || !project) throw createError({ statusCode: 404, message: 'Project not found.' })
  if (!roleAtLeast(membership.role, needed)) {
    throw createError({ statusCode: 403, message: `This needs the ${needed} role or higher; you are ${membership.role}.` })
  }
  return { user, project, role: membership.role }
}
