import { StoredFile } from '~~/server/database/models'

/** Lists the project's data files with what each holds (every member). */
export default defineEventHandler(async (event) => {
  const { project } = await requireProjectRole(event, 'viewer')
  const files = await StoredFile.findAll({ where: { projectId: project.id }, attributes: { exclude: ['data'] }, order: [['name', 'ASC']] })
  return toStoredFileDtos(files)
})
