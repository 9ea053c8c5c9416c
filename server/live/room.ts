/**
 * One network being co-edited on this instance: its Yjs document, presence,
 * and the connected peers. Speaks the y-websocket wire protocol (y-protocols
 * sync and awareness). Every update from a peer that may write is checked,
 * logged in PostgreSQL, and only then applied and broadcast; peers that may
 * only read get every update but their sync-step-2 and update messages are
 * dropped.
 */
import * as Y from 'yjs'
import * as syncProtocol from 'y-protocols/sync'
import * as awarenessProtocol from 'y-protocols/awareness'
import * as encoding from 'lib0/encoding'
import * as decoding from 'lib0/decoding'
import { NETWORK_ROOT } from '#shared/live/network-ydoc'
import { checkUpdateOn } from '#shared/live/strict-read'
import { appendUpdate, loadLiveState, mergeLiveState, publishPresence, readUpdate } from './store'
import { PRESENCE_BATCH_MS, PresenceBatch, presenceGroups } from './presence-batch'

const MESSAGE_SYNC = 0
const MESSAGE_AWARENESS = 1
const MESSAGE_QUERY_AWARENESS = 3
/** Largest presence state of one client, as JSON characters (a cursor, a selection and a name fit easily). */
const MAX_PRESENCE_CHARS = 8 * 1024
/** Awareness bytes per notification to the other instances (PostgreSQL refuses payloads of 8000 bytes; base64 adds a third). */
const PRESENCE_NOTIFY_BYTES = 5000

/**
 * Close codes the browser composable understands. y-websocket's client gives up
 * on 4400–4499 (no point retrying) and reconnects on anything else.
 */
export const CLOSE = {
  /** The update was undecodable or outside the document. */
  badUpdate: 4400,
  /** The session ended (signed out, signed out everywhere, revoked, password changed). */
  sessionEnded: 4401,
  /** No longer a member of the project, or the network is gone. */
  noAccess: 4403,
  /** Too big an update. */
  tooLarge: 4413,
  /** The role changed: reconnect (4500–4599 is "try again") to get the new rights. */
  roleChanged: 4509,
} as const

/** A connected client as the room sees it. */
export interface LivePeer {
  readonly id: string
  readonly userId: string
  readonly name: string
  role: string
  sessionVersion: number
  /** The session row it came in with; revoking the row closes the connection. */
  readonly sessionId: string
  send: (data: Uint8Array) => void
  close: (code: number, reason: string) => void
}

export interface RoomOptions {
  instanceId: string
  maxUpdateBytes: number
  mergeDelayMs: number
}

/** Whether a role may change the document. */
export function roleWrites(role: string): boolean {
  return role === 'owner' || role === 'editor'
}

export class LiveRoom {
  readonly doc = new Y.Doc()
  readonly awareness = new awarenessProtocol.Awareness(this.doc)
  readonly peers = new Set<LivePeer>()
  readonly ready: Promise<boolean>
  /** Awareness client ids each peer controls: removed when it leaves, and nobody else may speak for them. */
  private readonly controlled = new Map<LivePeer, Set<number>>()
  /** The same, from client id to its peer. */
  private readonly owners = new Map<number, LivePeer>()
  private readonly presence = new PresenceBatch(PRESENCE_BATCH_MS, (changed, local) => this.sendPresence(changed, local))
  /** Ids of logged updates already in `doc`, so a notification does not fetch them again. */
  private readonly applied = new Set<string>()
  private readonly chains = new Map<LivePeer, Promise<void>>()
  private mergeTimer: ReturnType<typeof setTimeout> | null = null
  private merging: Promise<void> = Promise.resolve()
  /** Counters for logs and the benchmark. */
  readonly stats = { accepted: 0, dropped: 0, refused: 0, catchUps: 0 }
  private catchingUp: Promise<void> | null = null
  private catchUpAgain = false

  constructor(readonly networkId: string, private readonly options: RoomOptions) {
    // The server is no participant: it shows no presence of its own.
    this.awareness.setLocalState(null)
    this.doc.on('update', (update: Uint8Array, origin: unknown) => this.broadcastUpdate(update, origin))
    this.awareness.on('update', (change: { added: number[], updated: number[], removed: number[] }, origin: unknown) => this.broadcastAwareness(change, origin))
    this.ready = this.load()
  }

  private async load(): Promise<boolean> {
    const stored = await loadLiveState(this.networkId)
    if (!stored) return false
    Y.applyUpdate(this.doc, stored.state, 'db')
    for (const u of stored.updates) this.applyStored(u.id, u.data)
    return true
  }

  private applyStored(id: string, data: Uint8Array): void {
    this.applied.add(id)
    // Bounded: ids are only a shortcut; applying an update twice is harmless in Yjs.
    if (this.applied.size > 10_000) this.applied.delete(this.applied.values().next().value!)
    Y.applyUpdate(this.doc, data, 'db')
  }

  /** A peer joins: it gets our state vector (sync step 1) and everyone's presence. */
  join(peer: LivePeer): void {
    this.peers.add(peer)
    this.controlled.set(peer, new Set())
    const encoder = encoding.createEncoder()
    encoding.writeVarUint(encoder, MESSAGE_SYNC)
    syncProtocol.writeSyncStep1(encoder, this.doc)
    peer.send(encoding.toUint8Array(encoder))
    const states = this.awareness.getStates()
    if (states.size) peer.send(this.awarenessMessage([...states.keys()]))
  }

  /** Messages of one peer are handled in order; the room is loaded before any is answered. */
  receive(peer: LivePeer, data: Uint8Array): Promise<void> {
    const previous = this.chains.get(peer) ?? Promise.resolve()
    const next = previous.then(() => this.handle(peer, data)).catch((error) => {
      console.warn(`[live] network ${this.networkId}: message from ${peer.userId} failed: ${(error as Error).message}`)
    })
    this.chains.set(peer, next)
    return next
  }

  /** A peer leaves: its presence goes; resolves once its last message is handled. */
  async leave(peer: LivePeer): Promise<void> {
    this.peers.delete(peer)
    const ids = this.controlled.get(peer)
    this.controlled.delete(peer)
    for (const id of ids ?? []) this.owners.delete(id)
    if (ids?.size) awarenessProtocol.removeAwarenessStates(this.awareness, [...ids], peer)
    await this.chains.get(peer)
    this.chains.delete(peer)
  }

  private async handle(peer: LivePeer, data: Uint8Array): Promise<void> {
    if (!(await this.ready)) return
    const decoder = decoding.createDecoder(data)
    const type = decoding.readVarUint(decoder)
    if (type === MESSAGE_SYNC) {
      const step = decoding.readVarUint(decoder)
      if (step === syncProtocol.messageYjsSyncStep1) {
        const encoder = encoding.createEncoder()
        encoding.writeVarUint(encoder, MESSAGE_SYNC)
        syncProtocol.writeSyncStep2(encoder, this.doc, decoding.readVarUint8Array(decoder))
        peer.send(encoding.toUint8Array(encoder))
      } else if (step === syncProtocol.messageYjsSyncStep2 || step === syncProtocol.messageYjsUpdate) {
        const update = decoding.readVarUint8Array(decoder)
        if (!roleWrites(peer.role)) {
          this.stats.dropped++
          return
        }
        await this.accept(peer, update)
      }
    } else if (type === MESSAGE_AWARENESS) {
      const update = this.stampAwareness(peer, decoding.readVarUint8Array(decoder))
      if (update) awarenessProtocol.applyAwarenessUpdate(this.awareness, update, peer)
    } else if (type === MESSAGE_QUERY_AWARENESS) {
      peer.send(this.awarenessMessage([...this.awareness.getStates().keys()]))
    }
  }

  /** Checks an update, logs it, then applies it (which broadcasts it). */
  private async accept(peer: LivePeer, update: Uint8Array): Promise<void> {
    if (update.length > this.options.maxUpdateBytes) {
      this.refuse(peer, CLOSE.tooLarge, `update of ${update.length} bytes is over the limit of ${this.options.maxUpdateBytes}`)
      return
    }
    let decoded: ReturnType<typeof Y.decodeUpdate>
    try {
      decoded = Y.decodeUpdate(update)
    } catch (error) {
      this.refuse(peer, CLOSE.badUpdate, `undecodable update (${(error as Error).message})`)
      return
    }
    const foreignRoot = decoded.structs.find(s => s instanceof Y.Item && typeof s.parent === 'string' && s.parent !== NETWORK_ROOT) as Y.Item | undefined
    if (foreignRoot) {
      this.refuse(peer, CLOSE.badUpdate, `update writes outside the network document (root "${String(foreignRoot.parent)}")`)
      return
    }
    // A client with nothing new answers sync step 1 with an empty update: nothing to log.
    if (decoded.structs.length === 0 && decoded.ds.clients.size === 0) return
    // Tried on a scratch copy first: an update that would leave a document outside the contract is never logged or sent on.
    const checked = checkUpdateOn(this.doc, update)
    if (!checked.ok) {
      this.refuse(peer, CLOSE.badUpdate, `update refused: ${checked.reason}`)
      return
    }
    const id = await appendUpdate(this.networkId, update, peer.userId, this.options.instanceId)
    this.stats.accepted++
    this.applied.add(id)
    Y.applyUpdate(this.doc, update, peer)
    this.scheduleMerge()
  }

  private refuse(peer: LivePeer, code: number, reason: string): void {
    this.stats.refused++
    console.warn(`[live] network ${this.networkId}: refused an update from user ${peer.userId}: ${reason}`)
    peer.close(code, reason.slice(0, 120))
  }

  /**
   * Presence says who someone is: the server writes the name and role from the
   * session into each state, and a client id belongs to the first peer that
   * used it, so nobody can show up as someone else.
   */
  private stampAwareness(peer: LivePeer, update: Uint8Array): Uint8Array | null {
    const mine = this.controlled.get(peer)
    if (!mine) return null
    const decoder = decoding.createDecoder(update)
    const encoder = encoding.createEncoder()
    const count = decoding.readVarUint(decoder)
    const entries: Array<[number, number, string]> = []
    for (let i = 0; i < count; i++) {
      const clientId = decoding.readVarUint(decoder)
      const clock = decoding.readVarUint(decoder)
      const json = decoding.readVarString(decoder)
      const owner = this.owners.get(clientId)
      if (owner && owner !== peer) continue
      if (clientId === this.doc.clientID) continue
      // One presence per connection, of bounded size: nobody fills the room with states.
      if (mine.size && !mine.has(clientId)) continue
      if (json.length > MAX_PRESENCE_CHARS) continue
      let state: Record<string, unknown> | null
      try {
        state = JSON.parse(json) as Record<string, unknown> | null
      } catch {
        continue
      }
      if (state !== null && (typeof state !== 'object' || Array.isArray(state))) continue
      if (state === null) {
        mine.delete(clientId)
        this.owners.delete(clientId)
      } else {
        mine.add(clientId)
        this.owners.set(clientId, peer)
        state = { ...state, user: { id: peer.userId, name: peer.name, role: peer.role } }
      }
      entries.push([clientId, clock, JSON.stringify(state)])
    }
    if (!entries.length) return null
    encoding.writeVarUint(encoder, entries.length)
    for (const [clientId, clock, json] of entries) {
      encoding.writeVarUint(encoder, clientId)
      encoding.writeVarUint(encoder, clock)
      encoding.writeVarString(encoder, json)
    }
    return encoding.toUint8Array(encoder)
  }

  private awarenessMessage(clients: number[]): Uint8Array {
    const encoder = encoding.createEncoder()
    encoding.writeVarUint(encoder, MESSAGE_AWARENESS)
    encoding.writeVarUint8Array(encoder, awarenessProtocol.encodeAwarenessUpdate(this.awareness, clients))
    return encoding.toUint8Array(encoder)
  }

  private broadcastUpdate(update: Uint8Array, origin: unknown): void {
    const encoder = encoding.createEncoder()
    encoding.writeVarUint(encoder, MESSAGE_SYNC)
    syncProtocol.writeUpdate(encoder, update)
    const message = encoding.toUint8Array(encoder)
    for (const peer of this.peers) if (peer !== origin) peer.send(message)
  }

  private broadcastAwareness(change: { added: number[], updated: number[], removed: number[] }, origin: unknown): void {
    const clients = [...change.added, ...change.updated, ...change.removed]
    // Presence of this instance's peers goes to the other instances; presence that came from them does not go back.
    const local = !!origin && typeof origin === 'object' && 'userId' in origin
    this.presence.add(clients, local)
  }

  /** One awareness message per peer for every change of a batch, and the local ones to the other instances. */
  private sendPresence(changed: number[], local: number[]): void {
    const known = changed.filter(id => this.awareness.meta.has(id))
    if (known.length) {
      const message = this.awarenessMessage(known)
      for (const peer of this.peers) peer.send(message)
    }
    for (const group of presenceGroups(this.awareness, local, PRESENCE_NOTIFY_BYTES)) {
      const update = awarenessProtocol.encodeAwarenessUpdate(this.awareness, group)
      publishPresence(this.options.instanceId, this.networkId, update).catch((error) => {
        console.warn(`[live] presence not published: ${(error as Error).message}`)
      })
    }
  }

  /** Presence from another instance. */
  applyRemotePresence(update: Uint8Array): void {
    awarenessProtocol.applyAwarenessUpdate(this.awareness, update, 'bus')
  }

  /** An update another instance logged: fetch it by id; when it is already merged away, read the state. */
  async applyNotified(updateId: string): Promise<void> {
    if (!(await this.ready) || this.applied.has(updateId)) return
    const stored = await readUpdate(updateId)
    if (stored) this.applyStored(stored.id, stored.data)
    else await this.catchUp()
  }

  /**
   * Reads the stored state and every logged update: what notifications may have
   * missed while unsubscribed. One read at a time: callers during a read share
   * one more read after it (a room that fell behind a merge would otherwise
   * start a full read for every update it was notified of, and fall further behind).
   */
  catchUp(): Promise<void> {
    if (this.catchingUp) {
      this.catchUpAgain = true
      return this.catchingUp
    }
    this.catchingUp = (async () => {
      try {
        do {
          this.catchUpAgain = false
          this.stats.catchUps++
          await this.readStored()
        } while (this.catchUpAgain)
      } finally {
        this.catchingUp = null
      }
    })()
    return this.catchingUp
  }

  private async readStored(): Promise<void> {
    if (!(await this.ready)) return
    const stored = await loadLiveState(this.networkId)
    if (!stored) return
    Y.applyUpdate(this.doc, stored.state, 'db')
    for (const u of stored.updates) if (!this.applied.has(u.id)) this.applyStored(u.id, u.data)
  }

  private scheduleMerge(): void {
    if (this.mergeTimer) return
    this.mergeTimer = setTimeout(() => {
      this.mergeTimer = null
      void this.merge()
    }, this.options.mergeDelayMs)
  }

  /** Folds the log into the stored state and updates the JSON document; one merge at a time per room. `final`: the session ends (history keeps a checkpoint). */
  merge(options: { final?: boolean } = {}): Promise<void> {
    if (this.mergeTimer) {
      clearTimeout(this.mergeTimer)
      this.mergeTimer = null
    }
    this.merging = this.merging.then(async () => {
      try {
        await mergeLiveState(this.networkId, options)
      } catch (error) {
        console.warn(`[live] network ${this.networkId}: merge failed: ${(error as Error).message}`)
      }
    })
    return this.merging
  }

  /** Waits for every peer's pending messages (used before the last merge). */
  async settle(): Promise<void> {
    await Promise.all([...this.chains.values()])
  }

  destroy(): void {
    if (this.mergeTimer) clearTimeout(this.mergeTimer)
    // Departures still go to the other instances, which would otherwise show these peers until their presence times out.
    this.presence.flush()
    this.presence.dispose()
    this.awareness.destroy()
    this.doc.destroy()
  }
}
