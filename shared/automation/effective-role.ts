import type { ProjectRole } from '../types/api'
import type { TokenRoleCeiling } from '../types/access-token'

const rank: Record<ProjectRole, number> = { viewer: 0, reviewer: 1, editor: 2, owner: 3 }

/** The role a token acts with in a project: the lower of its ceiling and its owner's current membership role. */
export function effectiveTokenRole(ceiling: TokenRoleCeiling, membership: ProjectRole): ProjectRole {
  return rank[ceiling] <= rank[membership] ? ceiling : membership
}
