import { updateLibrarySubstrateSchema } from '#shared/schemas/substrate-library'

/** Changes a board of the project's substrate library (owners and editors). */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const substrate = await requireLibrarySubstrate(event, project.id)
  const body = await readBodyAs(event, updateLibrarySubstrateSchema)
  if (body.name !== undefined) await requireFreeSubstrateName(project.id, body.name, substrate.id)
  await substrate.update({ ...body, updatedBy: user.id })
  await recordAudit('substrate.changed', user.id, project.id, { substrateId: substrate.id, name: substrate.name })
  return toLibrarySubstrateDto(substrate)
})
