/**
 * Live co-editing: all of the editor's Yjs wiring sits here. The network's
 * document lives in a Yjs document synced with the server over y-websocket;
 * the editor store works on it through a DocumentSource (`createLiveSource`),
 * so every local edit is one Yjs transaction and remote edits arrive as store
 * changes. Undo and redo take back only this user's own changes (Y.UndoManager
 * tracks the local origin only). Presence carries the selection; the server
 * stamps who each person is.
 *
 * Edits made while the connection is down stay in the Yjs document and are
 * sent when it is back (y-websocket's sync exchange). For people who may edit,
 * the document is also kept in the browser's IndexedDB (y-indexeddb), so edits
 * made offline survive closing the tab: the next visit opens the kept copy when
 * the live server cannot be reached, and the two merge once it can. Both get
 * local edits when the page is next idle rather than inside the edit
 * (utils/editor/deferredUpdates.ts), so a slider step is drawn first.
 */
import { onBeforeUnmount, ref, shallowRef, watch, type InjectionKey, type Ref } from 'vue'
import * as Y from 'yjs'
import { WebsocketProvider } from 'y-websocket'
import { IndexeddbPersistence } from 'y-indexeddb'
import { deferLocalUpdates } from '~~/app/utils/editor/deferredUpdates'
import type { NetworkDocument } from '~~/shared/network/types'
import type { NetworkDto } from '~~/shared/types/api'
import { createNetworkReader, hasNetwork, NETWORK_ROOT, readNetwork, writeNetwork, writeNetworkChanges } from '~~/shared/live/network-ydoc'
import { useEditorStore } from '~~/app/stores/editor'
import { createMergeTracker, draftOf, type ChangeOrigin, type DocumentSource } from '~~/app/utils/editor/documentSource'
import { peersFrom, type PresencePeer } from '~~/app/utils/editor/presence'

/** The other people in the network, provided by the page for the canvas's selection outlines. */
export const LIVE_PEERS: InjectionKey<Readonly<Ref<PresencePeer[]>>> = Symbol('live-peers')

/** Where the live connection stands, as the indicator shows it. */
export type LiveStatus = 'connecting' | 'live' | 'offline' | 'unavailable' | 'refused'

export interface LiveSourceOptions {
  /** Window in which edits with one merge key form one undo step. @default 1000 */
  mergeWindowMs?: number
  /** Clock, replaceable in tests. @default Date.now */
  now?: () => number
}

/** A DocumentSource over a Yjs document that already holds a network; `destroy` detaches it. */
export function createLiveSource(doc: Y.Doc, options: LiveSourceOptions = {}): DocumentSource & { destroy: () => void } {
  const mergeWindow = options.mergeWindowMs ?? 1000
  const now = options.now ?? Date.now
  const root = doc.getMap(NETWORK_ROOT)
  const localOrigin = { local: true }
  const replaceOrigin = { replace: true }
  // Only transactions with the local origin are tracked: remote edits are never undone here.
  const undoManager = new Y.UndoManager(root, { trackedOrigins: new Set([localOrigin]), captureTimeout: mergeWindow })
  const listeners = new Set<(d: NetworkDocument, origin: ChangeOrigin) => void>()
  // Re-reads only what a transaction changed: unchanged blocks keep their identity across snapshots.
  const reader = createNetworkReader(doc)
  let current = reader.read()
  const merges = createMergeTracker(mergeWindow, now)

  // afterTransaction (registered after the undo manager's own) sees the undo stacks already updated.
  const onTransaction = (tr: Y.Transaction) => {
    // The document holds nothing but the network, so any changed type is a change of it.
    if (tr.changed.size === 0) return
    reader.changed(tr)
    current = reader.read()
    let origin: ChangeOrigin = 'remote'
    if (tr.origin === localOrigin) origin = 'local'
    else if (tr.origin === replaceOrigin) origin = 'replace'
    else if (tr.origin === undoManager) origin = undoManager.redoing ? 'redo' : 'undo'
    if (origin !== 'local') merges.reset()
    for (const l of listeners) l(current, origin)
  }
  doc.on('afterTransaction', onTransaction)

  return {
    snapshot: () => current,
    transact(edit, opts = {}) {
      const draft = draftOf(current, edit)
      if (!draft) return false
      if (!merges.continues(opts.mergeKey)) undoManager.stopCapturing()
      const previous = current
      doc.transact(() => writeNetworkChanges(doc, previous, draft), localOrigin)
      return true
    },
    replace(next, opts = {}) {
      undoManager.stopCapturing()
      merges.reset()
      doc.transact(() => writeNetwork(doc, next), opts.undoable ? localOrigin : replaceOrigin)
      if (!opts.undoable) undoManager.clear()
    },
    undo: () => undoManager.undo() !== null,
    redo: () => undoManager.redo() !== null,
    canUndo: () => undoManager.canUndo(),
    canRedo: () => undoManager.canRedo(),
    subscribe(listener) {
      listeners.add(listener)
      return () => listeners.delete(listener)
    },
    destroy() {
      doc.off('afterTransaction', onTransaction)
      undoManager.destroy()
      listeners.clear()
    },
  }
}

/** The IndexedDB database that keeps a network's live document in this browser. */
export function keptDocumentName(networkId: string): string {
  return `portwright:network:${networkId}`
}

export interface LiveNetworkOptions {
  /** How long to wait for the first sync before editing without live co-editing. @default 8000 */
  connectTimeoutMs?: number
}

/**
 * Connects the editor store to the live document of `network`. Until the first
 * sync the editor is read-only (the server's copy decides); if no sync comes in
 * time, live editing is given up for this visit and `status` says so (the page
 * then saves through the API as before).
 */
export function useLiveNetwork(network: NetworkDto, options: LiveNetworkOptions = {}) {
  const store = useEditorStore()
  const status = ref<LiveStatus>('connecting')
  const peers = shallowRef<PresencePeer[]>([])
  /** True once the store edits the live document. */
  const active = ref(false)
  const message = ref('')
  let mayWrite = network.role === 'owner' || network.role === 'editor'
  const doc = new Y.Doc()
  let source: ReturnType<typeof createLiveSource> | null = null
  const wsBase = `${location.protocol === 'https:' ? 'wss' : 'ws'}://${location.host}/live/networks`
  // BroadcastChannel between tabs is off: every change goes through the server, which enforces roles.
  const provider = new WebsocketProvider(wsBase, network.id, doc, { disableBc: true, maxBackoffTime: 4000 })
  store.readOnly = true
  // The browser's own copy, for people who may edit: edits made offline outlive the tab.
  const kept = mayWrite ? new IndexeddbPersistence(keptDocumentName(network.id), doc) : null
  // Both write local edits when the page is next idle, not inside the edit (a slider step draws its plot first).
  const deferred = deferLocalUpdates(doc, kept ? [provider._updateHandler, kept._storeUpdate] : [provider._updateHandler], {
    immediateOrigins: new Set<unknown>(kept ? [provider, kept] : [provider]),
  })
  const flushOnHide = () => { if (document.visibilityState === 'hidden') deferred.flush() }
  window.addEventListener('pagehide', deferred.flush)
  document.addEventListener('visibilitychange', flushOnHide)
  let keptReady = false
  kept?.whenSynced.then(() => {
    keptReady = true
    if (provider.wsUnsuccessfulReconnects > 0) attachKept()
  }).catch(() => {})

  /** Opens the kept copy when the server cannot be reached; returns whether it did. */
  function attachKept(): boolean {
    if (active.value || !keptReady || !hasNetwork(doc)) return false
    attach()
    refreshStatus()
    return true
  }

  const timeout = setTimeout(() => {
    if (active.value || attachKept()) return
    status.value = 'unavailable'
    message.value = 'Live co-editing is not reachable; changes are saved without it.'
    provider.destroy()
    store.readOnly = !mayWrite
  }, options.connectTimeoutMs ?? 8000)

  function attach() {
    if (active.value || !hasNetwork(doc)) return
    clearTimeout(timeout)
    source = createLiveSource(doc)
    store.load(readNetwork(doc), { readOnly: !mayWrite, source })
    active.value = true
  }

  function refreshStatus() {
    if (status.value === 'refused' || status.value === 'unavailable') return
    if (provider.wsconnected && provider.synced) status.value = 'live'
    else status.value = active.value ? 'offline' : 'connecting'
  }

  provider.on('sync', (isSynced: boolean) => {
    if (isSynced) attach()
    refreshStatus()
  })
  provider.on('status', refreshStatus)
  // A failed connection before the first sync: the kept copy, if any, opens at once.
  provider.on('connection-error', () => { attachKept() })
  provider.on('connection-close', async (event) => {
    const code = event?.code ?? 0
    if (code === 4401 || code === 4403) {
      status.value = 'refused'
      message.value = code === 4401 ? 'Your session has ended; sign in again to keep editing.' : 'You no longer have access to this network.'
      store.readOnly = true
    } else if (code === 4509) {
      // Role changed: ask the API for the new one; the provider reconnects on its own.
      try {
        const fresh = await $fetch<NetworkDto>(`/api/projects/${network.projectId}/networks/${network.id}`)
        mayWrite = fresh.role === 'owner' || fresh.role === 'editor'
        store.readOnly = !mayWrite
        message.value = `Your role is now ${fresh.role}.`
      } catch {
        store.readOnly = true
      }
    } else if (code === 4400 || code === 4413) {
      status.value = 'refused'
      message.value = 'The server refused a change from this editor; reload to continue.'
      store.readOnly = true
    }
    if (code !== 4401 && code !== 4403 && code !== 4400 && code !== 4413) attachKept()
    refreshStatus()
  })

  provider.awareness.on('change', () => {
    peers.value = peersFrom(provider.awareness.getStates() as Map<number, Record<string, unknown>>, doc.clientID)
  })
  watch(() => store.selection.blocks, (blocks) => {
    provider.awareness.setLocalStateField('selection', [...blocks])
  }, { immediate: true })

  function dispose() {
    clearTimeout(timeout)
    window.removeEventListener('pagehide', deferred.flush)
    document.removeEventListener('visibilitychange', flushOnHide)
    deferred.dispose()
    provider.destroy()
    source?.destroy()
    // Closing waits for pending IndexedDB writes; destroying the doc afterwards is harmless.
    void kept?.destroy()
    doc.destroy()
  }
  onBeforeUnmount(dispose)

  return { status, peers, active, message, dispose }
}
