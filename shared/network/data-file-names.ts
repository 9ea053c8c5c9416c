/** Names of the files that `data` blocks of these documents name (unknown shapes are skipped). */
export function dataFileNames(documents: Iterable<unknown>): string[] {
  const named = new Set<string>()
  for (const document of documents) {
    const blocks = (document as { blocks?: unknown } | null)?.blocks
    if (!Array.isArray(blocks)) continue
    for (const block of blocks as Array<{ type?: unknown; params?: Record<string, unknown> }>) {
      const file = block?.params?.file
      if (block?.type === 'data' && typeof file === 'string') named.add(file)
    }
  }
  return [...named]
}
