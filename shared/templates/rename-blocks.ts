import type { BlockSpec, NetworkDocument, Wire } from '../network/types'

/** The block id a terminal `BLOCK.N` belongs to, and its number. */
function splitTerminal(terminal: string): [string, string] {
  const dot = terminal.lastIndexOf('.')
  return [terminal.slice(0, dot), terminal.slice(dot + 1)]
}

/** Renames blocks by a map of old id → new id, in the blocks and the wires; ids not in the map stay. */
export function renameBlocks(document: NetworkDocument, names: ReadonlyMap<string, string>): NetworkDocument {
  const rename = (id: string) => names.get(id) ?? id
  const blocks: BlockSpec[] = document.blocks.map(block => ({ ...block, id: rename(block.id) }))
  const wires: Wire[] = document.wires.map(wire => wire.map((terminal) => {
    const [id, n] = splitTerminal(terminal)
    return `${rename(id)}.${n}`
  }) as Wire)
  return { ...document, blocks, wires }
}
