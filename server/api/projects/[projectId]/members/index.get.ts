import { listMembers } from '~~/server/utils/members'

/** The project's members and their roles, for any member. */
export default defineEventHandler(async (event) => {
  const { project } = await requireProjectRole(event, 'viewer')
  return listMembers(project.id)
})
