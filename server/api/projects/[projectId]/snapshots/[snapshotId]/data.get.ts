import { z } from 'zod'
import { SnapshotFile } from '~~/server/database/models'
import type { StoredFileDataDto } from '#shared/types/api'

const querySchema = z.object({ file: z.string().min(1, 'Name the data file.').max(255, 'A file name has at most 255 characters.') })

/**
 * The S-parameters of a data file as this snapshot froze it (any member): its own copy, read again
 * in the worker pool, whatever has happened to the project's file since (replaced or deleted).
 */
export default defineEventHandler(async (event): Promise<StoredFileDataDto> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const query = queryAs(event, querySchema)
  const { snapshot } = await requireSnapshot(event, project.id)
  const copy = await SnapshotFile.findOne({ where: { snapshotId: snapshot.id, name: query.file } })
  if (!copy) throw createError({ statusCode: 404, message: `This snapshot keeps no data file named ${query.file}.` })
  const read = await readTouchstoneInPool({ name: copy.name, text: copy.data.toString('latin1') })
  if (!read.ok) throw createError({ statusCode: 422, message: `${copy.name} in this snapshot does not read as a Touchstone file: line ${read.line}: ${read.reason}.` })
  const parsed = read.file
  return {
    name: copy.name,
    ports: parsed.ports,
    impedances: parsed.impedances,
    frequencies: Array.from(parsed.frequencies),
    re: Array.from(parsed.re),
    im: Array.from(parsed.im),
  }
})
