import type { H3Event } from 'h3'
import { z } from 'zod'
import { Membership, User } from '~~/server/database/models'
import type { MemberDto, ProjectRole } from '#shared/types/api'

const memberParams = z.object({ projectId: z.uuid(), userId: z.uuid() })

/** The `userId` route parameter; malformed ids answer 404. */
export function memberIdParam(event: H3Event): string {
  return paramsAs(event, memberParams).userId
}

/** Members of a project, owners first, then by name. */
export async function listMembers(projectId: string): Promise<MemberDto[]> {
  const memberships = await Membership.findAll({ where: { projectId } })
  const users = await User.findAll({ where: { id: memberships.map(m => m.userId) } })
  const byId = new Map(users.map(u => [u.id, u]))
  const order: ProjectRole[] = ['owner', 'editor', 'reviewer', 'viewer']
  return memberships
    .map(m => ({ userId: m.userId, email: byId.get(m.userId)!.email, name: byId.get(m.userId)!.name, role: m.role }))
    .sort((a, b) => order.indexOf(a.role) - order.indexOf(b.role) || a.name.localeCompare(b.name))
}

/** Loads a membership row under a lock, inside `transaction`-scoped work; 404 when absent. */
async function lockedMembers(projectId: string, transaction: import('sequelize').Transaction) {
  // Locking every membership row of the project serialises concurrent owner changes.
  return Membership.findAll({ where: { projectId }, transaction, lock: transaction.LOCK.UPDATE })
}

function assertOwnerRemains(all: Membership[], userId: string, newRole: ProjectRole | null) {
  const owners = all.filter(m => m.role === 'owner' && m.userId !== userId).length
  const target = all.find(m => m.userId === userId)!
  if (target.role === 'owner' && newRole !== 'owner' && owners === 0) {
    throw createError({ statusCode: 409, message: 'A project needs at least one owner: make someone else owner first.' })
  }
}

/** Changes a role, keeping at least one owner. */
export async function changeMemberRole(projectId: string, userId: string, role: ProjectRole) {
  return useDatabase().transaction(async (transaction) => {
    const all = await lockedMembers(projectId, transaction)
    const target = all.find(m => m.userId === userId)
    if (!target) throw createError({ statusCode: 404, message: 'Member not found.' })
    assertOwnerRemains(all, userId, role)
    const previousRole = target.role
    await target.update({ role }, { transaction })
    const user = await User.findByPk(userId, { transaction })
    return { userId, previousRole, email: user!.email, name: user!.name }
  })
}

/** Removes a member, keeping at least one owner. */
export async function removeMember(projectId: string, userId: string) {
  return useDatabase().transaction(async (transaction) => {
    const all = await lockedMembers(projectId, transaction)
    const target = all.find(m => m.userId === userId)
    if (!target) throw createError({ statusCode: 404, message: 'Member not found.' })
    assertOwnerRemains(all, userId, null)
    await target.destroy({ transaction })
    return { userId, role: target.role }
  })
}
