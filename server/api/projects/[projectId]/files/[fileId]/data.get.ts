import type { StoredFileDataDto } from '#shared/types/api'

/** A data file's S-parameters for the editor's solver, read again from the stored bytes (every member). */
export default defineEventHandler(async (event): Promise<StoredFileDataDto> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const file = await requireStoredFile(event, project.id)
  // It was read when stored; reading again keeps one source of truth (the bytes) and the reader's checks,
  // in the worker pool so that many readers of a large file never hold the event loop.
  const read = await readTouchstoneInPool({ name: file.name, text: file.data.toString('latin1') })
  if (!read.ok) throw createError({ statusCode: 422, message: `${file.name} no longer reads as a Touchstone file: line ${read.line}: ${read.reason}.` })
  const parsed = read.file
  return {
    name: file.name,
    ports: parsed.ports,
    impedances: parsed.impedances,
    frequencies: Array.from(parsed.frequencies),
    re: Array.from(parsed.re),
    im: Array.from(parsed.im),
  }
})
