import { AccessTokenProject, Membership, Project } from '~~/server/database/models'
import type { TokenSelfDto } from '#shared/types/access-token'
import { effectiveTokenRole } from '#shared/automation/effective-role'

/**
 * What the calling token may do now: its name, expiry, ceiling and its effective role in each project of its
 * scope where its owner is still a member (projects they left are not listed).
 */
export default defineEventHandler(async (event): Promise<TokenSelfDto> => {
  const { token, user } = await requireToken(event)
  const links = await AccessTokenProject.findAll({ where: { tokenId: token.id } })
  const ids = links.map(l => l.projectId)
  const [memberships, projects] = ids.length
    ? await Promise.all([Membership.findAll({ where: { userId: user.id, projectId: ids } }), Project.findAll({ where: { id: ids }, attributes: ['id', 'name'] })])
    : [[], []]
  const roles = new Map(memberships.map(m => [m.projectId, m.role]))
  return {
    name: token.name,
    expiresAt: token.expiresAt.toISOString(),
    roleCeiling: token.roleCeiling,
    projects: projects.filter(p => roles.has(p.id))
      .map(p => ({ id: p.id, name: p.name, role: effectiveTokenRole(token.roleCeiling, roles.get(p.id)!) }))
      .sort((a, b) => a.name.localeCompare(b.name)),
  }
})
