/** Removes a member (owners); the last owner cannot be removed. */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'owner')
  const removed = await removeMember(project.id, memberIdParam(event))
  await recordAudit('member.removed', user.id, project.id, { userId: removed.userId, role: removed.role })
  // Their open live connections close now, on every app instance, not at the next periodic check.
  await liveAccessChanged(project.id)
  return { removed: true }
})
