/**
 * Edits of a network document as pure functions on a draft. The editor store
 * runs them inside a document-source transaction, so each is one undo step.
 */
import type { BlockSpec, NetworkDocument } from '~~/shared/network/types'
import { blockCatalog, kindSpec, terminalCount, GRID, type BlockKind, type ParamValue } from './blockCatalog'
import { orientedSize, turn, type Rotation } from './geometry'
import { fitDefaults } from './blockDefaults'
import { addSubstrate } from './substrateOps'

export type Wire = [string, string]
export interface Layout { x: number, y: number, rotation?: Rotation, flip?: boolean }

/** Parse `BLOCK.N` into its parts; null when malformed. */
export function parseTerminal(ref: string): { block: string, n: number } | null {
  const dot = ref.lastIndexOf('.')
  if (dot <= 0) return null
  const n = Number(ref.slice(dot + 1))
  if (!Number.isInteger(n) || n < 1) return null
  return { block: ref.slice(0, dot), n }
}

/** Stable id for a wire regardless of the order of its ends. */
export function wireKey(w: readonly [string, string]): string {
  return w[0] < w[1] ? `${w[0]}~${w[1]}` : `${w[1]}~${w[0]}`
}

/** First unused id of the form PREFIX + number. */
export function freshId(prefix: string, taken: ReadonlySet<string>): string {
  for (let i = 1; ; i++) {
    const id = `${prefix}${i}`
    if (!taken.has(id)) return id
  }
}

function portIndices(doc: NetworkDocument): number[] {
  return doc.blocks.filter(b => b.type === 'port').map(b => Number(b.params.index)).filter(Number.isFinite)
}

/** The next free port number (ports count 1…N without gaps). */
export function nextPortIndex(doc: NetworkDocument): number {
  return Math.max(0, ...portIndices(doc)) + 1
}

/** Placement of a block; blocks saved without one are laid out on a simple grid by their order. */
export function layoutOf(block: BlockSpec, order: number): Required<Layout> {
  const l = block.layout as Layout | undefined
  if (l && Number.isFinite(l.x) && Number.isFinite(l.y)) return { x: l.x, y: l.y, rotation: l.rotation ?? 0, flip: l.flip ?? false }
  return { x: (order % 6) * GRID * 8, y: Math.floor(order / 6) * GRID * 7, rotation: 0, flip: false }
}

/** Add a block of `kind` at a canvas position; returns its id. */
export function addBlock(doc: NetworkDocument, kind: BlockKind, at: { x: number, y: number }): string {
  const spec = blockCatalog[kind]
  const id = freshId(spec.idPrefix, new Set(doc.blocks.map(b => b.id)))
  const params: Record<string, ParamValue> = { ...spec.defaults }
  fitDefaults(params, doc)
  if (kind === 'port') params.index = nextPortIndex(doc)
  if (kind === 'microstrip' || kind === 'microstripOpen' || kind === 'microstripStep' || kind === 'microstripBend' || kind === 'microstripTee' || kind === 'coupledMicrostrip') {
    // The block needs a substrate to be solved: use the first one, or start one the settings panel can edit.
    params.substrate = Object.keys(doc.substrates ?? {})[0] ?? addSubstrate(doc)
  }
  doc.blocks.push({ id, type: kind, params, layout: { x: at.x, y: at.y, rotation: 0, flip: false } } as BlockSpec)
  // Coupled lines are a block type of contract 1.1; a document using one says so.
  if (kind === 'coupled') doc.version = 1.1
  return id
}

/** Add a data block (its `file`) or a sub-network (its `network`) at a canvas position; returns its id. */
export function addExternalBlock(doc: NetworkDocument, type: 'data' | 'subnetwork', ref: string, at: { x: number, y: number }): string {
  const id = freshId(type === 'data' ? 'D' : 'SN', new Set(doc.blocks.map(b => b.id)))
  const params: Record<string, ParamValue> = type === 'data' ? { file: ref } : { network: ref }
  doc.blocks.push({ id, type, params, layout: { x: at.x, y: at.y, rotation: 0, flip: false } } as BlockSpec)
  // Data blocks came with contract 1.1; a document using one says so.
  if (type === 'data' && doc.version < 1.1) doc.version = 1.1
  return id
}

/** Whether `ref` names an existing terminal of the document (or of the blocks found by `find`). */
export function terminalExists(doc: NetworkDocument, ref: string, find: (id: string) => BlockSpec | undefined = id => doc.blocks.find(b => b.id === id)): boolean {
  const t = parseTerminal(ref)
  if (!t) return false
  const block = find(t.block)
  if (!block) return false
  const count = terminalCount(block.type)
  // Blocks whose terminals come from outside data (data sets, sub-networks) cannot be checked here.
  return count === 0 || t.n <= count
}

/** Join two terminals; refuses self-wires, duplicates and unknown terminals. Returns whether a wire was added. */
export function connect(doc: NetworkDocument, a: string, b: string): boolean {
  if (a === b || !terminalExists(doc, a) || !terminalExists(doc, b)) return false
  const key = wireKey([a, b])
  if (doc.wires.some(w => wireKey(w as Wire) === key)) return false
  doc.wires.push([a, b])
  return true
}

/** Remove wires by key. */
export function disconnect(doc: NetworkDocument, keys: ReadonlySet<string>): void {
  doc.wires = doc.wires.filter(w => !keys.has(wireKey(w as Wire)))
}

/** Drop wires that touch a missing block or terminal, self-wires and duplicates: a saved wire always joins two real terminals. */
export function pruneWires(doc: NetworkDocument): void {
  const seen = new Set<string>()
  // Looked up by id: every edit prunes (the solver gets the pruned document), and a scan per wire end grows with blocks × wires.
  const byId = new Map(doc.blocks.map(b => [b.id, b]))
  const find = (id: string) => byId.get(id)
  doc.wires = doc.wires.filter((w) => {
    const key = wireKey(w as Wire)
    if (w[0] === w[1] || seen.has(key) || !terminalExists(doc, w[0], find) || !terminalExists(doc, w[1], find)) return false
    seen.add(key)
    return true
  })
}

/** Close the gaps that deleting ports leaves in their numbering, keeping their order. */
export function renumberPorts(doc: NetworkDocument): void {
  const ports = doc.blocks.filter(b => b.type === 'port' && Number.isFinite(Number(b.params.index)))
  ports.sort((p, q) => Number(p.params.index) - Number(q.params.index))
  ports.forEach((p, i) => { p.params.index = i + 1 })
}

/** Delete blocks and every wire touching them; renumbers ports when one was removed. */
export function removeBlocks(doc: NetworkDocument, ids: ReadonlySet<string>): void {
  const hadPort = doc.blocks.some(b => ids.has(b.id) && b.type === 'port')
  doc.blocks = doc.blocks.filter(b => !ids.has(b.id))
  pruneWires(doc)
  if (hadPort) renumberPorts(doc)
}

function ensureLayout(doc: NetworkDocument, block: BlockSpec): Required<Layout> {
  const layout = layoutOf(block, doc.blocks.indexOf(block))
  block.layout = layout
  return layout
}

/** Move blocks to absolute positions. */
export function moveBlocks(doc: NetworkDocument, positions: Record<string, { x: number, y: number }>): void {
  for (const block of doc.blocks) {
    const p = positions[block.id]
    if (!p) continue
    const l = ensureLayout(doc, block)
    l.x = p.x
    l.y = p.y
  }
}

/** Shift blocks by a pixel offset. */
export function nudgeBlocks(doc: NetworkDocument, ids: ReadonlySet<string>, dx: number, dy: number): void {
  for (const block of doc.blocks) {
    if (!ids.has(block.id)) continue
    const l = ensureLayout(doc, block)
    l.x += dx
    l.y += dy
  }
}

/** Turn blocks a quarter turn about their own centre, keeping that centre on the grid. */
export function rotateBlocks(doc: NetworkDocument, ids: ReadonlySet<string>, dir: 1 | -1): void {
  for (const block of doc.blocks) {
    if (!ids.has(block.id)) continue
    const spec = kindSpec(block.type)
    const l = ensureLayout(doc, block)
    if (spec) {
      const before = orientedSize(spec.width, spec.height, l.rotation)
      const shift = ((before.width - before.height) / 2) * GRID
      // Whole grid steps only, so terminals stay on grid points after the turn.
      l.x += Math.round(shift / GRID) * GRID
      l.y -= Math.round(shift / GRID) * GRID
    }
    l.rotation = turn(l.rotation, dir)
  }
}

/** Mirror blocks left to right in their own frame. */
export function flipBlocks(doc: NetworkDocument, ids: ReadonlySet<string>): void {
  for (const block of doc.blocks) {
    if (!ids.has(block.id)) continue
    const l = ensureLayout(doc, block)
    l.flip = !l.flip
  }
}

/** Set one parameter; `undefined` removes it so the block falls back to its default. */
export function setParam(doc: NetworkDocument, id: string, param: string, value: ParamValue | undefined): void {
  const block = doc.blocks.find(b => b.id === id)
  if (!block) return
  if (value === undefined) delete block.params[param]
  else block.params[param] = value
}

/** Switch a line or stub between electrical length (degrees at a frequency) and physical length. */
export function setLengthMode(doc: NetworkDocument, id: string, mode: 'electrical' | 'physical'): void {
  const block = doc.blocks.find(b => b.id === id)
  if (!block) return
  if (mode === 'physical') {
    delete block.params.degrees
    delete block.params.at
    block.params.length ??= '75 mm'
  }
  else {
    delete block.params.length
    delete block.params.velocityFactor
    block.params.degrees ??= 90
    block.params.at ??= '1 GHz'
  }
}

/** What copy puts on the clipboard: blocks plus the wires running between them. */
export interface Fragment { blocks: BlockSpec[], wires: Wire[] }

/** Cut a fragment out of the document (deep copies). */
export function extractFragment(doc: NetworkDocument, ids: ReadonlySet<string>): Fragment {
  const blocks = doc.blocks.filter(b => ids.has(b.id)).map((b) => {
    const copy = structuredClone(b) as BlockSpec
    copy.layout = layoutOf(b, doc.blocks.indexOf(b))
    return copy
  })
  const wires = doc.wires.filter(w => ids.has(parseTerminal(w[0])?.block ?? '') && ids.has(parseTerminal(w[1])?.block ?? '')) as Wire[]
  return { blocks, wires: wires.map(w => [w[0], w[1]]) }
}

/** Paste a fragment with fresh ids and port numbers, offset on the canvas; returns the new ids. */
export function pasteFragment(doc: NetworkDocument, fragment: Fragment, offset: { x: number, y: number }): string[] {
  const taken = new Set(doc.blocks.map(b => b.id))
  const rename = new Map<string, string>()
  let nextIndex = nextPortIndex(doc)
  for (const source of fragment.blocks) {
    const spec = kindSpec(source.type)
    const id = freshId(spec?.idPrefix ?? source.type.slice(0, 2).toUpperCase(), taken)
    taken.add(id)
    rename.set(source.id, id)
    const block = structuredClone(source) as BlockSpec
    block.id = id
    const l = layoutOf(source, 0)
    block.layout = { ...l, x: l.x + offset.x, y: l.y + offset.y }
    if (block.type === 'port') block.params.index = nextIndex++
    doc.blocks.push(block)
  }
  for (const [a, b] of fragment.wires) {
    const ta = parseTerminal(a)
    const tb = parseTerminal(b)
    if (!ta || !tb) continue
    connect(doc, `${rename.get(ta.block)}.${ta.n}`, `${rename.get(tb.block)}.${tb.n}`)
  }
  return [...rename.values()]
}

/** Rename a block, rewriting the wires that reference it. Returns false when the new id is taken or malformed. */
export function renameBlock(doc: NetworkDocument, from: string, to: string): boolean {
  if (!/^[A-Za-z_][A-Za-z0-9_]*$/.test(to) || doc.blocks.some(b => b.id === to)) return false
  const block = doc.blocks.find(b => b.id === from)
  if (!block) return false
  block.id = to
  doc.wires = doc.wires.map(w => w.map((end) => {
    const t = parseTerminal(end)
    return t && t.block === from ? `${to}.${t.n}` : end
  }) as Wire)
  return true
}

/** Number of wires at each terminal, keyed `BLOCK.N`. */
export function wireCount(doc: NetworkDocument): Map<string, number> {
  const counts = new Map<string, number>()
  for (const [a, b] of doc.wires) {
    counts.set(a, (counts.get(a) ?? 0) + 1)
    counts.set(b, (counts.get(b) ?? 0) + 1)
  }
  return counts
}
