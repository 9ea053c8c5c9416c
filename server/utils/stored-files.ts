import type { H3Event } from 'h3'
import { z } from 'zod'
import { Network, StoredFile, User } from '~~/server/database/models'
import { TOUCHSTONE_LIMITS } from '#shared/touchstone/limits'
import type { TouchstoneFile } from '#shared/touchstone/types'
import type { StoredFileDto, StoredFileSummary } from '#shared/types/api'

// Names become references in documents and download file names: plain characters and a Touchstone extension.
const FILE_NAME = /^[A-Za-z0-9][A-Za-z0-9 ._()-]{0,118}\.s\d{1,2}p$/i

/** A Touchstone upload that passed every check: its name, bytes and what it holds. */
export interface CheckedUpload {
  name: string
  data: Buffer
  parsed: TouchstoneFile
}

/**
 * Reads the multipart field `file` and checks it at the door: size, a `.sNp` name of plain characters,
 * and content that reads as a Touchstone file whose ports match the name (read in the worker pool). 400/413 in the user's words otherwise.
 */
export async function readTouchstoneUpload(event: H3Event): Promise<CheckedUpload> {
  const parts = await readMultipartFormData(event).catch(() => {
    throw createError({ statusCode: 400, message: 'Send the file as multipart form data in a field named "file".' })
  })
  const part = parts?.find(p => p.name === 'file' && p.filename !== undefined)
  if (!part) throw createError({ statusCode: 400, message: 'Send the file as multipart form data in a field named "file".' })
  const limitMiB = TOUCHSTONE_LIMITS.uploadBytes / 1024 / 1024
  if (part.data.length > TOUCHSTONE_LIMITS.uploadBytes) throw createError({ statusCode: 413, message: `The file is larger than ${limitMiB} MiB, the most a project file may be.` })
  if (part.data.length === 0) throw createError({ statusCode: 400, message: 'The file is empty.' })
  const name = (part.filename ?? '').split(/[\\/]/).pop()!.trim()
  if (!FILE_NAME.test(name)) {
    throw createError({ statusCode: 400, message: 'The file name must end in .sNp (such as amp.s2p) and use letters, digits, spaces, dots, dashes, underscores or brackets, at most 120 characters.' })
  }
  const read = await readTouchstoneInPool({ name, text: part.data.toString('latin1') }).catch((error) => {
    if (error && typeof error === 'object' && 'statusCode' in error) throw error
    throw createError({ statusCode: 400, message: `${name} could not be read as a Touchstone file.` })
  })
  if (!read.ok) throw createError({ statusCode: 400, message: `${name} is not a Touchstone file we can read: line ${read.line}: ${read.reason}.` })
  return { name, data: part.data, parsed: read.file }
}

/** What the Files list shows of a read file. */
export function summaryOf(parsed: TouchstoneFile): StoredFileSummary {
  return {
    ports: parsed.ports,
    startFrequency: parsed.frequencies[0]!,
    stopFrequency: parsed.frequencies[parsed.frequencies.length - 1]!,
    points: parsed.frequencies.length,
    impedances: [...parsed.impedances],
    version: parsed.version,
    parameter: parsed.options.parameter,
    format: parsed.options.format,
    noisePoints: parsed.noise.length,
  }
}

const fileParams = z.object({ projectId: z.uuid(), fileId: z.uuid() })

/** Loads a file of the given project from the route; 404 when it is not there. */
export async function requireStoredFile(event: H3Event, projectId: string): Promise<StoredFile> {
  const { fileId } = paramsAs(event, fileParams)
  const file = await StoredFile.findOne({ where: { id: fileId, projectId } })
  if (!file) throw createError({ statusCode: 404, message: 'File not found.' })
  return file
}

/** Networks of the project whose saved document has a `data` block naming this file. */
export async function networksUsingFile(projectId: string, name: string): Promise<Array<{ id: string; name: string }>> {
  const networks = await Network.findAll({ where: { projectId }, attributes: ['id', 'name', 'document'] })
  return networks
    .filter(n => (n.document.blocks ?? []).some(b => b.type === 'data' && (b.params as Record<string, unknown> | undefined)?.file === name))
    .map(n => ({ id: n.id, name: n.name }))
}

/** Plain DTOs of stored files, with the name of whoever stored each version. */
export async function toStoredFileDtos(files: StoredFile[]): Promise<StoredFileDto[]> {
  const ids = [...new Set(files.map(f => f.updatedBy ?? f.createdBy).filter((id): id is string => !!id))]
  const users = ids.length ? await User.findAll({ where: { id: ids }, attributes: ['id', 'name'] }) : []
  const names = new Map(users.map(u => [u.id, u.name]))
  return files.map((file) => {
    const by = file.updatedBy ?? file.createdBy
    return {
      id: file.id,
      name: file.name,
      size: file.size,
      version: file.version,
      summary: file.summary,
      uploadedBy: by ? names.get(by) ?? null : null,
      uploadedAt: (file.updatedAt ?? file.createdAt).toISOString(),
    }
  })
}
