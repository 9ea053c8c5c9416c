import { changeRoleSchema } from '#shared/schemas/project'

/** Changes a member's role (owners); the last owner cannot be demoted. */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'owner')
  const { role } = await readBodyAs(event, changeRoleSchema)
  const member = await changeMemberRole(project.id, memberIdParam(event), role)
  await recordAudit('member.role-changed', user.id, project.id, { userId: member.userId, from: member.previousRole, to: role })
  // A demoted editor's live connection becomes read-only now, on every app instance.
  await liveAccessChanged(project.id)
  return { userId: member.userId, email: member.email, name: member.name, role }
})
