/**
 * The network editor's state: the document (behind a DocumentSource), the
 * selection, the clipboard and the read-only switch. Every edit goes through
 * `edit()`, so every edit is one undoable step and nothing else writes the
 * document.
 */
import { defineStore } from 'pinia'
import { computed, markRaw, ref, shallowRef } from 'vue'
import type { NetworkDocument, Sweep } from '~~/shared/network/types'
import type { BlockKind, ParamValue } from '~~/app/utils/editor/blockCatalog'
import type { Quantity } from '~~/app/utils/editor/traces'
import type { PlotBand } from '~~/app/utils/editor/plotTypes'
import { GRID } from '~~/app/utils/editor/blockCatalog'
import {
  addBlock as addBlockOp, addExternalBlock as addExternalBlockOp, connect as connectOp, disconnect, extractFragment, flipBlocks, moveBlocks as moveBlocksOp,
  nudgeBlocks, pasteFragment, pruneWires, removeBlocks, renameBlock as renameBlockOp, rotateBlocks, setLengthMode as setLengthModeOp,
  setParam as setParamOp, wireKey, type Fragment, type Wire,
} from '~~/app/utils/editor/documentOps'
import { createMemorySource, type ChangeOrigin, type DocumentSource, type TransactOptions } from '~~/app/utils/editor/documentSource'
import { emptyDocument } from '~~/app/utils/editor/emptyDocument'
import {
  addSubstrate as addSubstrateOp, removeSubstrate as removeSubstrateOp, renameSubstrate as renameSubstrateOp,
  setSubstrateValue as setSubstrateValueOp, type SubstrateField,
} from '~~/app/utils/editor/substrateOps'

/** A frequency marker on the plots. */
export interface Marker { id: number, frequency: number }
export type ResultsView = 'response' | 'smith' | 'balance' | 'table' | 'spec' | 'array' | 'evenodd'

/** How the results dock is set up: view state, not part of the document and not undoable. */
export interface ResultsSettings {
  view: ResultsView
  quantity: Quantity
  /** Traces on the Response view, by name ("S21"). */
  traces: string[]
  /** Reflection traces on the Smith chart. */
  smithTraces: string[]
  markers: Marker[]
  activeMarker: number | null
  balance: { a: string, b: string, targetDb: number, targetDeg: number }
  /** Bands shaded on the frequency plots: review comments when a snapshot is open; none in the editor. */
  bands: PlotBand[]
}

export interface Selection {
  blocks: string[]
  wires: string[]
}

export const useEditorStore = defineStore('editor', () => {
  let source: DocumentSource = markRaw(createMemorySource(emptyDocument('Untitled network')))
  let unsubscribe: () => void = () => {}
  const doc = shallowRef<NetworkDocument>(source.snapshot())
  /** Bumped on every change; lets watchers (autosave, solver) react without deep-watching. */
  const version = ref(0)
  const lastOrigin = ref<ChangeOrigin>('replace')
  const history = ref({ canUndo: false, canRedo: false })
  const selection = ref<Selection>({ blocks: [], wires: [] })
  const readOnly = ref(false)
  const clipboard = shallowRef<Fragment | null>(null)
  let pasteCount = 0
  const results = ref<ResultsSettings>({
    view: 'response', quantity: 'db', traces: [], smithTraces: [], markers: [], activeMarker: null,
    balance: { a: 'S21', b: 'S31', targetDb: 0, targetDeg: 90 },
    bands: [],
  })
  let markerIds = 0

  /** Put a marker at a frequency and make it the active one. */
  function addMarker(frequency: number) {
    const id = ++markerIds
    results.value.markers.push({ id, frequency })
    results.value.activeMarker = id
  }
  function moveMarker(id: number, frequency: number) {
    const m = results.value.markers.find(x => x.id === id)
    if (m) m.frequency = frequency
  }
  /** Show these markers (read from the document), keeping the active one by position. */
  function setMarkers(frequencies: readonly number[]) {
    const at = results.value.markers.findIndex(m => m.id === results.value.activeMarker)
    results.value.markers = frequencies.map(frequency => ({ id: ++markerIds, frequency }))
    results.value.activeMarker = results.value.markers[Math.min(Math.max(at, 0), results.value.markers.length - 1)]?.id ?? null
  }
  function removeMarker(id: number) {
    results.value.markers = results.value.markers.filter(m => m.id !== id)
    if (results.value.activeMarker === id) results.value.activeMarker = results.value.markers.at(-1)?.id ?? null
  }

  function attach(next: DocumentSource) {
    unsubscribe()
    source = markRaw(next)
    doc.value = source.snapshot()
    unsubscribe = source.subscribe((d, origin) => {
      doc.value = d
      lastOrigin.value = origin
      version.value++
      // A new object on every edit would re-render everything that shows undo and redo.
      const canUndo = source.canUndo(), canRedo = source.canRedo()
      if (history.value.canUndo !== canUndo || history.value.canRedo !== canRedo) history.value = { canUndo, canRedo }
      dropVanishedSelection()
    })
    history.value = { canUndo: source.canUndo(), canRedo: source.canRedo() }
  }
  attach(source)

  function dropVanishedSelection() {
    const ids = new Set(doc.value.blocks.map(b => b.id))
    const wires = new Set(doc.value.wires.map(w => wireKey(w as Wire)))
    const blocks = selection.value.blocks.filter(id => ids.has(id))
    const keptWires = selection.value.wires.filter(k => wires.has(k))
    if (blocks.length !== selection.value.blocks.length || keptWires.length !== selection.value.wires.length)
      selection.value = { blocks, wires: keptWires }
  }

  /** Run one edit as one undo step; ignored when read-only. */
  function edit(fn: (draft: NetworkDocument) => void, options?: TransactOptions): boolean {
    if (readOnly.value) return false
    return source.transact(fn, options)
  }

  /** Start editing a document (from the server, an import or a test); clears history. */
  function load(document: NetworkDocument, options: { readOnly?: boolean, source?: DocumentSource } = {}) {
    const clean = structuredClone(document)
    pruneWires(clean)
    attach(options.source ?? createMemorySource(clean))
    readOnly.value = options.readOnly ?? false
    selection.value = { blocks: [], wires: [] }
    // Markers belong to a network (saved under view.markers): another network starts without the last one's.
    results.value.markers = []
    results.value.activeMarker = null
    version.value++
    lastOrigin.value = 'replace'
  }

  /** Replace the document with an imported one, as one undoable step. */
  function replaceDocument(document: NetworkDocument) {
    if (readOnly.value) return
    const clean = structuredClone(document)
    pruneWires(clean)
    source.replace(clean, { undoable: true })
    history.value = { canUndo: source.canUndo(), canRedo: source.canRedo() }
  }

  const selectedBlocks = computed(() => new Set(selection.value.blocks))
  const selectedBlock = computed(() =>
    selection.value.blocks.length === 1 ? doc.value.blocks.find(b => b.id === selection.value.blocks[0]) : undefined)

  function select(blocks: string[], wires: string[] = []) {
    selection.value = { blocks: [...new Set(blocks)], wires: [...new Set(wires)] }
  }
  function selectAll() {
    select(doc.value.blocks.map(b => b.id), doc.value.wires.map(w => wireKey(w as Wire)))
  }
  /** Step the selection to the next (or previous) block in document order, for keyboard users. */
  function selectNext(dir: 1 | -1) {
    const ids = doc.value.blocks.map(b => b.id)
    if (!ids.length) return
    const at = ids.indexOf(selection.value.blocks[selection.value.blocks.length - 1] ?? '')
    const next = at < 0 ? (dir > 0 ? 0 : ids.length - 1) : (at + dir + ids.length) % ids.length
    select([ids[next]!])
  }

  function addBlock(kind: BlockKind, at: { x: number, y: number }): string | undefined {
    let id: string | undefined
    edit((d) => { id = addBlockOp(d, kind, at) })
    if (id) select([id])
    return id
  }
  /** Place a data block or sub-network naming its file or network; selects it. */
  function addExternal(type: 'data' | 'subnetwork', ref: string, at: { x: number, y: number }): string | undefined {
    let id: string | undefined
    edit((d) => { id = addExternalBlockOp(d, type, ref, at) })
    if (id) select([id])
    return id
  }
  function connect(a: string, b: string): boolean {
    let ok = false
    edit((d) => { ok = connectOp(d, a, b) })
    return ok
  }
  function removeWires(keys: string[]) {
    edit(d => disconnect(d, new Set(keys)))
  }
  function deleteSelection() {
    const blocks = new Set(selection.value.blocks)
    const wires = new Set(selection.value.wires)
    edit((d) => {
      disconnect(d, wires)
      removeBlocks(d, blocks)
    })
  }
  function rotateSelection(dir: 1 | -1 = 1) {
    edit(d => rotateBlocks(d, selectedBlocks.value, dir))
  }
  function flipSelection() {
    edit(d => flipBlocks(d, selectedBlocks.value))
  }
  function moveBlocks(positions: Record<string, { x: number, y: number }>) {
    edit(d => moveBlocksOp(d, positions))
  }
  function nudgeSelection(dx: number, dy: number) {
    edit(d => nudgeBlocks(d, selectedBlocks.value, dx * GRID, dy * GRID), { mergeKey: `nudge:${selection.value.blocks.join(',')}` })
  }
  function setParam(id: string, param: string, value: ParamValue | undefined) {
    edit(d => setParamOp(d, id, param, value), { mergeKey: `param:${id}.${param}` })
  }
  function setLengthMode(id: string, mode: 'electrical' | 'physical') {
    edit(d => setLengthModeOp(d, id, mode))
  }
  function renameBlock(from: string, to: string): boolean {
    let ok = false
    edit((d) => { ok = renameBlockOp(d, from, to) })
    if (ok) select([to])
    return ok
  }

  function copySelection() {
    if (!selection.value.blocks.length) return
    clipboard.value = extractFragment(doc.value, selectedBlocks.value)
    pasteCount = 0
  }
  function paste() {
    const fragment = clipboard.value
    if (!fragment) return
    pasteCount++
    let ids: string[] = []
    edit((d) => { ids = pasteFragment(d, fragment, { x: 2 * GRID * pasteCount, y: 2 * GRID * pasteCount }) })
    if (ids.length) select(ids)
  }
  function duplicateSelection() {
    copySelection()
    paste()
  }

  /** Document-level settings: name, reference impedance, sweep, variables. */
  function setName(name: string) {
    edit((d) => { d.name = name }, { mergeKey: 'name' })
  }
  function setReferenceImpedance(value: ParamValue) {
    edit((d) => { d.referenceImpedance = value }, { mergeKey: 'referenceImpedance' })
  }
  function setSweep(patch: Partial<Sweep>) {
    edit((d) => { d.sweep = { ...(d.sweep ?? emptyDocument('').sweep!), ...patch } }, { mergeKey: `sweep:${Object.keys(patch).join(',')}` })
  }
  function setVariable(name: string, expression: ParamValue) {
    edit((d) => { d.variables = { ...(d.variables ?? {}), [name]: expression } }, { mergeKey: `var:${name}` })
  }
  function renameVariable(from: string, to: string): boolean {
    if (!/^[A-Za-z_]\w*$/.test(to) || (to !== from && to in (doc.value.variables ?? {}))) return false
    edit((d) => {
      d.variables = Object.fromEntries(Object.entries(d.variables ?? {}).map(([k, v]) => [k === from ? to : k, v]))
    })
    return true
  }
  function removeVariable(name: string) {
    edit((d) => {
      const next = { ...d.variables }
      delete next[name]
      d.variables = next
    })
  }

  /** The document's substrates: add, edit one key, rename (blocks follow), remove. */
  function addSubstrate(): string | undefined {
    let name: string | undefined
    edit((d) => { name = addSubstrateOp(d) })
    return name
  }
  function setSubstrateValue(name: string, key: SubstrateField, value: ParamValue | undefined) {
    edit(d => setSubstrateValueOp(d, name, key, value), { mergeKey: `substrate:${name}.${key}` })
  }
  function renameSubstrate(from: string, to: string): boolean {
    let renamed = false
    edit((d) => { renamed = renameSubstrateOp(d, from, to) })
    return renamed
  }
  function removeSubstrate(name: string) {
    edit(d => removeSubstrateOp(d, name))
  }

  function undo() { if (!readOnly.value) source.undo() }
  function redo() { if (!readOnly.value) source.redo() }

  /**
   * The document as it is saved, exported and solved: wires to nothing are impossible here. Snapshots are
   * never changed in place, so a shallow copy with its own wire list is enough: no deep copy on every step
   * of a slider.
   */
  function savedDocument(): NetworkDocument {
    const copy = { ...doc.value }
    pruneWires(copy)
    return copy
  }

  return {
    results, addMarker, moveMarker, removeMarker, setMarkers,
    doc, version, lastOrigin, history, selection, readOnly, clipboard, selectedBlocks, selectedBlock,
    load, replaceDocument, edit, select, addExternal, selectAll, selectNext,
    addBlock, connect, removeWires, deleteSelection, rotateSelection, flipSelection, moveBlocks, nudgeSelection,
    setParam, setLengthMode, renameBlock, copySelection, paste, duplicateSelection,
    setName, setReferenceImpedance, setSweep, setVariable, renameVariable, removeVariable,
    addSubstrate, setSubstrateValue, renameSubstrate, removeSubstrate,
    undo, redo, savedDocument,
  }
})
