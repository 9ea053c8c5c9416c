import type { NetworkDocument } from '~~/shared/network/types'
import type { TemplateFile } from '~~/shared/templates/types'

/** A project file as the file list gives it (only what choosing a name needs). */
export interface ListedFile {
  id: string
  name: string
  size: number
}

/** The project's file routes, as the gallery (or a test) reaches them. */
export interface ProjectFilesAccess {
  list(): Promise<ListedFile[]>
  /** The stored text of one file. */
  read(fileId: string): Promise<string>
  upload(name: string, text: string): Promise<void>
}

/** Where a template file ends up in the project: an existing file with the same text, or a new upload. */
export interface FilePlacement {
  templateName: string
  name: string
  uploaded: boolean
}

// How many "-2", "-3" … names to try before giving up on a crowded project.
const MAX_NAME_TRIES = 50

/** `lna.s2p` → `lna-2.s2p`: the n-th name tried for a template file whose name is taken by other data. */
export function alternativeName(name: string, n: number): string {
  if (n <= 1) return name
  const dot = name.lastIndexOf('.')
  return dot > 0 ? `${name.slice(0, dot)}-${n}${name.slice(dot)}` : `${name}-${n}`
}

/** Byte length of the text as the server stores it (the files are ASCII Touchstone). */
function storedSize(text: string): number {
  return new TextEncoder().encode(text).length
}

/**
 * Places one template file in the project: reuses a file holding the same text (under its own name,
 * or any name), else uploads it under its own name, or `name-2`, `name-3`… when that name holds other data.
 */
async function placeFile(file: TemplateFile, listed: ListedFile[], access: ProjectFilesAccess): Promise<FilePlacement> {
  const text = file.text()
  const size = storedSize(text)
  const texts = new Map<string, string>()
  const sameText = async (f: ListedFile) => {
    if (f.size !== size) return false
    if (!texts.has(f.id)) texts.set(f.id, await access.read(f.id))
    return texts.get(f.id) === text
  }
  // The template's own name first, then any other file of the same size.
  const ordered = [...listed].sort((a, b) => Number(b.name === file.name) - Number(a.name === file.name))
  for (const f of ordered) {
    if (await sameText(f)) return { templateName: file.name, name: f.name, uploaded: false }
  }
  const taken = new Set(listed.map(f => f.name))
  for (let n = 1; n <= MAX_NAME_TRIES; n++) {
    const name = alternativeName(file.name, n)
    if (taken.has(name)) continue
    await access.upload(name, text)
    return { templateName: file.name, name, uploaded: true }
  }
  throw new Error(`The project has too many files named like ${file.name}; rename or delete some and try again.`)
}

/** The document with every `data` block that names a template file renamed to where that file was placed. */
export function renameDataFiles(document: NetworkDocument, placements: readonly FilePlacement[]): NetworkDocument {
  const names = new Map(placements.map(p => [p.templateName, p.name]))
  return {
    ...document,
    blocks: document.blocks.map((block) => {
      const file = block.params?.file
      return block.type === 'data' && typeof file === 'string' && names.has(file) && names.get(file) !== file
        ? { ...block, params: { ...block.params, file: names.get(file)! } }
        : block
    }),
  }
}

/**
 * Brings a template's data files into the project (see `placeFile`) and returns the document with its
 * data blocks naming the files as placed, ready to be created as a network of that project.
 */
export async function bringTemplateFiles(document: NetworkDocument, files: readonly TemplateFile[], access: ProjectFilesAccess): Promise<{ document: NetworkDocument; placements: FilePlacement[] }> {
  if (files.length === 0) return { document, placements: [] }
  const listed = await access.list()
  const placements: FilePlacement[] = []
  for (const file of files) {
    const placement = await placeFile(file, listed, access)
    placements.push(placement)
    if (placement.uploaded) listed.push({ id: '', name: placement.name, size: -1 })
  }
  return { document: renameDataFiles(document, placements), placements }
}
