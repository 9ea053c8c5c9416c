import type { NetworkDocument, Problem } from './types'

/** What the topology check needs to know about each block beyond the document. */
export interface TopologyInfo {
  /** Number of terminals of a block, or undefined when unknown (its type or parameters failed). */
  terminals(blockId: string): number | undefined
  /** Port index of a port block, or undefined when the block is no port or its index failed. */
  portIndex(blockId: string): number | undefined
}

const TERMINAL = /^(.+)\.(\d+)$/

function terminalRange(count: number): string {
  return count === 1 ? 'only terminal 1' : `terminals 1–${count}`
}

/**
 * Checks wiring and ports: duplicate block ids, wires to missing blocks or terminals,
 * port indices that repeat, are missing or leave gaps, and ports on no wire.
 * Every message names the culprit.
 */
export function checkTopology(document: NetworkDocument, info: TopologyInfo): Problem[] {
  const problems: Problem[] = []
  const types = new Map<string, string>()
  for (const block of document.blocks) {
    if (types.has(block.id)) problems.push({ block: block.id, message: `block id ${block.id} is used by more than one block` })
    else types.set(block.id, block.type)
  }
  const wired = new Set<string>()
  document.wires.forEach((wire, w) => {
    for (const end of wire) {
      const where = `wire ${w + 1} (${wire[0]} – ${wire[1]})`
      const match = TERMINAL.exec(end)
      if (!match) {
        problems.push({ field: `wires[${w}]`, message: `${where}: "${end}" is not a terminal; write BLOCK.N, e.g. TA.1` })
        continue
      }
      const [, id, number] = match as unknown as [string, string, string]
      const type = types.get(id)
      if (type === undefined) {
        problems.push({ field: `wires[${w}]`, message: `${where}: there is no block ${id}` })
        continue
      }
      const count = info.terminals(id)
      const n = Number(number)
      if (count !== undefined && (n < 1 || n > count)) {
        problems.push({ block: id, field: `wires[${w}]`, message: `${where}: block ${id} (${type}) has ${terminalRange(count)}, so ${end} does not exist` })
        continue
      }
      wired.add(id)
    }
  })

  const byIndex = new Map<number, string>()
  let portCount = 0
  let unknownIndex = false
  for (const block of document.blocks) {
    if (block.type !== 'port') continue
    portCount++
    if (!wired.has(block.id)) problems.push({ block: block.id, message: `port ${block.id} is on no wire` })
    const index = info.portIndex(block.id)
    if (index === undefined) {
      unknownIndex = true
      continue
    }
    const other = byIndex.get(index)
    if (other !== undefined) problems.push({ block: block.id, field: 'index', message: `port ${block.id}, index: ${index} is also used by port ${other}` })
    else byIndex.set(index, block.id)
  }
  if (portCount === 0) problems.push({ message: 'the network has no ports: add at least one port block' })
  else if (!unknownIndex) {
    const highest = Math.max(...byIndex.keys())
    const missing = Array.from({ length: highest }, (_, i) => i + 1).filter(i => !byIndex.has(i))
    if (missing.length) {
      problems.push({ message: `port indices must run from 1 to ${highest} without gaps: ${missing.join(', ')} ${missing.length === 1 ? 'is' : 'are'} missing` })
    }
  }
  return problems
}
