/**
 * The one door to the network document. The editor reads snapshots and writes
 * through transactions; history (undo/redo) lives with the source because a
 * shared document must undo only the local user's own changes. Today's source
 * keeps the document in memory; a co-editing source can implement the same
 * interface on top of a shared document and its own undo manager.
 */
import type { NetworkDocument } from '~~/shared/network/types'

/** Who caused a change: the local user, an undo/redo step, a wholesale replacement, or a remote peer. */
export type ChangeOrigin = 'local' | 'undo' | 'redo' | 'replace' | 'remote'

export interface TransactOptions {
  /** Consecutive transactions with the same key within `mergeWindowMs` form one undo step (typing, sliders). */
  mergeKey?: string
}

export interface DocumentSource {
  /** The current document. Treat as read-only: it is frozen. */
  snapshot(): NetworkDocument
  /** Apply an edit to a draft copy; a no-op edit leaves history untouched. Returns whether anything changed. */
  transact(edit: (draft: NetworkDocument) => void, options?: TransactOptions): boolean
  /** Put a whole document in place (load, import, reload after a conflict). `undoable` keeps the previous one in history. */
  replace(doc: NetworkDocument, options?: { undoable?: boolean }): void
  undo(): boolean
  redo(): boolean
  canUndo(): boolean
  canRedo(): boolean
  /** Called after every change with the new snapshot. Returns an unsubscribe function. */
  subscribe(listener: (doc: NetworkDocument, origin: ChangeOrigin) => void): () => void
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value)
    for (const v of Object.values(value as object)) deepFreeze(v)
  }
  return value
}

/** Applies `edit` to a copy of `current`; undefined when the edit changed nothing. */
export function draftOf(current: NetworkDocument, edit: (draft: NetworkDocument) => void): NetworkDocument | undefined {
  const draft = structuredClone(current) as NetworkDocument
  edit(draft)
  return JSON.stringify(draft) === JSON.stringify(current) ? undefined : draft
}

/**
 * Decides whether an edit continues the previous one (same merge key within the window),
 * so that typing in one field or dragging a slider makes one undo step.
 */
export function createMergeTracker(windowMs: number, now: () => number) {
  let last: { key: string, at: number } | null = null
  return {
    /** Records this edit and says whether it merges into the previous one. */
    continues(key: string | undefined): boolean {
      const t = now()
      const merging = key !== undefined && last?.key === key && t - last.at < windowMs
      last = key !== undefined ? { key, at: t } : null
      return merging
    },
    /** Any other kind of change (undo, redo, replace, remote) ends the run. */
    reset() { last = null },
  }
}

export interface MemorySourceOptions {
  /** Most undo steps kept. @default 200 */
  historyLimit?: number
  /** Window in which edits with one merge key collapse. @default 1000 */
  mergeWindowMs?: number
  /** Clock, replaceable in tests. @default Date.now */
  now?: () => number
}

/** An in-memory document source with snapshot history. */
export function createMemorySource(initial: NetworkDocument, options: MemorySourceOptions = {}): DocumentSource {
  const limit = options.historyLimit ?? 200
  const mergeWindow = options.mergeWindowMs ?? 1000
  const now = options.now ?? Date.now
  let current = deepFreeze(structuredClone(initial))
  const undoStack: NetworkDocument[] = []
  const redoStack: NetworkDocument[] = []
  const listeners = new Set<(doc: NetworkDocument, origin: ChangeOrigin) => void>()
  const merges = createMergeTracker(mergeWindow, now)

  function emit(origin: ChangeOrigin) {
    for (const l of listeners) l(current, origin)
  }
  function pushUndo(doc: NetworkDocument) {
    undoStack.push(doc)
    if (undoStack.length > limit) undoStack.shift()
  }

  return {
    snapshot: () => current,
    transact(edit, opts = {}) {
      const draft = draftOf(current, edit)
      if (!draft) return false
      if (!merges.continues(opts.mergeKey)) pushUndo(current)
      redoStack.length = 0
      current = deepFreeze(draft)
      emit('local')
      return true
    },
    replace(doc, opts = {}) {
      if (opts.undoable) pushUndo(current)
      else { undoStack.length = 0 }
      redoStack.length = 0
      merges.reset()
      current = deepFreeze(structuredClone(doc))
      emit('replace')
    },
    undo() {
      const previous = undoStack.pop()
      if (!previous) return false
      redoStack.push(current)
      current = previous
      merges.reset()
      emit('undo')
      return true
    },
    redo() {
      const next = redoStack.pop()
      if (!next) return false
      undoStack.push(current)
      current = next
      merges.reset()
      emit('redo')
      return true
    },
    canUndo: () => undoStack.length > 0,
    canRedo: () => redoStack.length > 0,
    subscribe(listener) {
      listeners.add(listener)
      return () => listeners.delete(listener)
    },
  }
}
