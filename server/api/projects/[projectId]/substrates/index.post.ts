import { createLibrarySubstrateSchema, SUBSTRATE_LIBRARY_LIMIT } from '#shared/schemas/substrate-library'
import { ProjectSubstrate } from '~~/server/database/models'

/** Adds a board to the project's substrate library (owners and editors). */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const body = await readBodyAs(event, createLibrarySubstrateSchema)
  if (await ProjectSubstrate.count({ where: { projectId: project.id } }) >= SUBSTRATE_LIBRARY_LIMIT)
    throw createError({ statusCode: 409, message: `The library holds at most ${SUBSTRATE_LIBRARY_LIMIT} substrates; delete one first.` })
  await requireFreeSubstrateName(project.id, body.name)
  const made = await ProjectSubstrate.create({ ...body, projectId: project.id, updatedBy: user.id })
  await recordAudit('substrate.created', user.id, project.id, { substrateId: made.id, name: made.name })
  setResponseStatus(event, 201)
  return toLibrarySubstrateDto(made)
})
