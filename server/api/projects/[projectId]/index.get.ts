/** One project, for any member. */
export default defineEventHandler(async (event) => {
  const { project, role } = await requireProjectRole(event, 'viewer')
  return toProjectDto(project, role)
})
