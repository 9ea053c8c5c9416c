import { ProjectSubstrate } from '~~/server/database/models'

/** The project's substrate library, by name (every member). */
export default defineEventHandler(async (event) => {
  const { project } = await requireProjectRole(event, 'viewer')
  const rows = await ProjectSubstrate.findAll({ where: { projectId: project.id }, order: [['name', 'ASC']] })
  return rows.map(toLibrarySubstrateDto)
})
