import type { H3Event } from 'h3'
import { z } from 'zod'
import { ProjectSubstrate } from '~~/server/database/models'
import type { LibrarySubstrateDto } from '#shared/schemas/substrate-library'

/** A library board as a plain DTO. */
export function toLibrarySubstrateDto(s: ProjectSubstrate): LibrarySubstrateDto {
  return {
    id: s.id, name: s.name, permittivity: s.permittivity, height: s.height, thickness: s.thickness,
    lossTangent: s.lossTangent, conductivity: s.conductivity, roughness: s.roughness, note: s.note,
    updatedAt: s.updatedAt.toISOString(),
  }
}

/** Loads a board of the project's library from the route; 404 when it is not there. */
export async function requireLibrarySubstrate(event: H3Event, projectId: string): Promise<ProjectSubstrate> {
  const { substrateId } = paramsAs(event, z.object({ substrateId: z.uuid() }))
  const found = await ProjectSubstrate.findOne({ where: { id: substrateId, projectId } })
  if (!found) throw createError({ statusCode: 404, message: 'Substrate not found in this project\'s library.' })
  return found
}

/** Refuses a name another board of the project already has (409, in the user's words). */
export async function requireFreeSubstrateName(projectId: string, name: string, exceptId?: string): Promise<void> {
  const other = await ProjectSubstrate.findOne({ where: { projectId, name } })
  if (other && other.id !== exceptId) throw createError({ statusCode: 409, message: `The library already has a substrate called "${name}"; choose another name.` })
}
