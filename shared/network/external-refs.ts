import type { NetworkDocument } from './types'

/** A text parameter of a block, when it is a non-empty string. */
function textParam(block: { params?: unknown }, key: string): string | undefined {
  const value = (block.params as Record<string, unknown> | undefined)?.[key]
  return typeof value === 'string' && value !== '' ? value : undefined
}

/** The references (`network` params) of a document's subnetwork blocks, each once, in block order. */
export function subnetworkReferences(document: Pick<NetworkDocument, 'blocks'>): string[] {
  const refs = new Set<string>()
  for (const block of document.blocks ?? []) {
    const ref = block.type === 'subnetwork' ? textParam(block, 'network') : undefined
    if (ref) refs.add(ref)
  }
  return [...refs]
}

/** The file names (`file` params) of the data blocks of these documents, each once. */
export function dataFileReferences(documents: Iterable<Pick<NetworkDocument, 'blocks'>>): string[] {
  const names = new Set<string>()
  for (const document of documents) {
    for (const block of document.blocks ?? []) {
      const name = block.type === 'data' ? textParam(block, 'file') : undefined
      if (name) names.add(name)
    }
  }
  return [...names]
}
