/** Fold Vue Flow's `select` changes into a list of selected ids; null when the batch holds none. */
export function applySelectionChanges(current: readonly string[], changes: ReadonlyArray<{ type: string, id?: string, selected?: boolean }>): string[] | null {
  const selects = changes.filter(c => c.type === 'select' && c.id !== undefined)
  if (!selects.length) return null
  const next = new Set(current)
  for (const c of selects) {
    if (c.selected) next.add(c.id!)
    else next.delete(c.id!)
  }
  return [...next]
}
