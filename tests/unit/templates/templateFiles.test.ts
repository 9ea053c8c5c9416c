import { describe, expect, it } from 'vitest'
import { alternativeName, bringTemplateFiles, type ListedFile, type ProjectFilesAccess } from '../../../app/utils/templates/templateFiles'
import { findTemplate } from '../../../shared/templates/index'
import { INVENTED_AMPLIFIER_FILE, inventedAmplifierText } from '../../../shared/templates/invented-amplifier'

/** An in-memory project file store that counts reads and uploads. */
function memoryProject(initial: Array<{ name: string; text: string }>) {
  const files = initial.map((f, i) => ({ id: `f${i}`, ...f }))
  const calls = { reads: [] as string[], uploads: [] as string[] }
  const access: ProjectFilesAccess = {
    async list(): Promise<ListedFile[]> { return files.map(f => ({ id: f.id, name: f.name, size: f.text.length })) },
    async read(id) { calls.reads.push(id); return files.find(f => f.id === id)!.text },
    async upload(name, text) {
      if (files.some(f => f.name === name)) throw new Error(`409 ${name}`)
      calls.uploads.push(name)
      files.push({ id: `f${files.length}`, name, text })
    },
  }
  return { files, calls, access }
}

const template = findTemplate('balanced-amplifier')!
const amplifier = inventedAmplifierText()
const fileNames = (document: { blocks: Array<{ type: string; params: Record<string, unknown> }> }) => document.blocks.filter(b => b.type === 'data').map(b => b.params.file)

describe('bringTemplateFiles', () => {
  it('uploads the file into a project that has no files', async () => {
    const project = memoryProject([])
    const { document, placements } = await bringTemplateFiles(template.build(), template.files!, project.access)
    expect(project.calls.uploads).toEqual([INVENTED_AMPLIFIER_FILE])
    expect(project.files.find(f => f.name === INVENTED_AMPLIFIER_FILE)?.text).toBe(amplifier)
    expect(placements).toEqual([{ templateName: INVENTED_AMPLIFIER_FILE, name: INVENTED_AMPLIFIER_FILE, uploaded: true }])
    expect(fileNames(document)).toEqual([INVENTED_AMPLIFIER_FILE, INVENTED_AMPLIFIER_FILE])
  })

  it('keeps the project’s file when it holds the same text (the demo project), uploading nothing', async () => {
    const project = memoryProject([{ name: 'other.s1p', text: '# GHZ S RI R 50\n1 0 0\n' }, { name: INVENTED_AMPLIFIER_FILE, text: amplifier }])
    const { document } = await bringTemplateFiles(template.build(), template.files!, project.access)
    expect(project.calls.uploads).toEqual([])
    expect(project.calls.reads).toEqual(['f1']) // only the file of the same size is read
    expect(fileNames(document)).toEqual([INVENTED_AMPLIFIER_FILE, INVENTED_AMPLIFIER_FILE])
  })

  it('finds the same text under another name and uses that name', async () => {
    const project = memoryProject([{ name: 'front-end-lna.s2p', text: amplifier }])
    const { document } = await bringTemplateFiles(template.build(), template.files!, project.access)
    expect(project.calls.uploads).toEqual([])
    expect(fileNames(document)).toEqual(['front-end-lna.s2p', 'front-end-lna.s2p'])
  })

  it('never replaces other data under the same name: uploads as name-2 and points the blocks there', async () => {
    const project = memoryProject([{ name: INVENTED_AMPLIFIER_FILE, text: amplifier.replace('15 dB', '16 dB') }])
    const first = await bringTemplateFiles(template.build(), template.files!, project.access)
    expect(project.calls.uploads).toEqual(['lna-invented-2.s2p'])
    expect(project.files[0]!.text).not.toBe(amplifier)
    expect(fileNames(first.document)).toEqual(['lna-invented-2.s2p', 'lna-invented-2.s2p'])
    // A second network from the template reuses the uploaded copy.
    const second = await bringTemplateFiles(template.build(), template.files!, project.access)
    expect(project.calls.uploads).toEqual(['lna-invented-2.s2p'])
    expect(fileNames(second.document)).toEqual(['lna-invented-2.s2p', 'lna-invented-2.s2p'])
  })

  it('leaves templates without files alone', async () => {
    const project = memoryProject([])
    const quadrature = findTemplate('quadrature-split')!
    const document = quadrature.build()
    expect((await bringTemplateFiles(document, quadrature.files ?? [], project.access)).document).toBe(document)
    expect(project.calls.uploads).toEqual([])
  })

  it('numbers alternative names before the extension', () => {
    expect(alternativeName('lna.s2p', 1)).toBe('lna.s2p')
    expect(alternativeName('lna.s2p', 3)).toBe('lna-3.s2p')
  })
})
