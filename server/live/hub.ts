/**
 * All live rooms of this app instance: opens a room for the first peer of a
 * network and closes it (after a last merge) when the last one leaves, routes
 * notifications from other instances, and re-checks every peer's role on a
 * short interval and whenever a project's memberships change.
 */
import { randomUUID } from 'node:crypto'
import { LiveBus } from './bus'
import { CLOSE, LiveRoom, roleWrites, type LivePeer } from './room'
import { currentMemberships, liveSessionIds } from './store'

export interface HubOptions {
  databaseUrl: string
  maxUpdateBytes: number
  mergeDelayMs: number
  roleCheckMs: number
}

export class LiveHub {
  /** Distinguishes this instance's own notifications from the others'. */
  readonly instanceId = randomUUID()
  private readonly rooms = new Map<string, LiveRoom>()
  /** Rooms finishing their last merge: a new room for the network waits for it. */
  private readonly closing = new Map<string, Promise<void>>()
  /** A peer's room, as a promise: messages that arrive while the room is still opening wait for it, in order. */
  private readonly peerRooms = new Map<LivePeer, Promise<LiveRoom>>()
  private readonly joinedRooms = new Map<LivePeer, LiveRoom>()
  private readonly bus: LiveBus
  private roleTimer: ReturnType<typeof setInterval> | null = null
  private checking: Promise<void> | null = null

  constructor(private readonly options: HubOptions) {
    this.bus = new LiveBus(options.databaseUrl, {
      update: (networkId, updateId, instanceId) => {
        if (instanceId === this.instanceId) return
        this.rooms.get(networkId)?.applyNotified(updateId).catch(error => console.warn(`[live] catch-up of update ${updateId} failed: ${(error as Error).message}`))
      },
      presence: (instanceId, networkId, update) => {
        if (instanceId !== this.instanceId) this.rooms.get(networkId)?.applyRemotePresence(update)
      },
      access: () => void this.checkRoles(),
      resubscribed: () => {
        for (const room of this.rooms.values()) room.catchUp().catch(error => console.warn(`[live] catch-up failed: ${(error as Error).message}`))
      },
    })
  }

  start(): void {
    this.bus.start()
    this.roleTimer = setInterval(() => void this.checkRoles(), this.options.roleCheckMs)
  }

  /** Adds a peer to its network's room; resolves once the room has loaded the stored state. */
  async join(networkId: string, peer: LivePeer): Promise<boolean> {
    const opening = this.openRoom(networkId, peer)
    this.peerRooms.set(peer, opening)
    const room = await opening
    const loaded = await room.ready.catch((error) => {
      console.warn(`[live] network ${networkId} could not be loaded: ${(error as Error).message}`)
      return false
    })
    if (!loaded) peer.close(CLOSE.noAccess, 'network not available')
    return loaded
  }

  private async openRoom(networkId: string, peer: LivePeer): Promise<LiveRoom> {
    await this.closing.get(networkId)
    let room = this.rooms.get(networkId)
    if (!room) {
      room = new LiveRoom(networkId, { instanceId: this.instanceId, maxUpdateBytes: this.options.maxUpdateBytes, mergeDelayMs: this.options.mergeDelayMs })
      this.rooms.set(networkId, room)
    }
    room.join(peer)
    this.joinedRooms.set(peer, room)
    return room
  }

  receive(peer: LivePeer, data: Uint8Array): void {
    void this.peerRooms.get(peer)?.then(room => room.receive(peer, data))
  }

  /** Removes a peer; the last one out merges the log into the stored state and closes the room. */
  async leave(peer: LivePeer): Promise<void> {
    const opening = this.peerRooms.get(peer)
    if (!opening) return
    this.peerRooms.delete(peer)
    const room = await opening
    this.joinedRooms.delete(peer)
    await room.leave(peer)
    if (room.peers.size > 0 || this.rooms.get(room.networkId) !== room) return
    this.rooms.delete(room.networkId)
    const done = room.settle().then(() => room.merge({ final: true })).finally(() => {
      room.destroy()
      if (this.closing.get(room.networkId) === done) this.closing.delete(room.networkId)
    })
    this.closing.set(room.networkId, done)
    await done
  }

  /**
   * Reads every connected peer's current role and session version. A peer that
   * lost access or whose session ended is closed; a changed role takes effect at
   * once (a demoted editor's next write is dropped) and the peer is closed with
   * "role changed" so its client reconnects with the new rights.
   */
  checkRoles(): Promise<void> {
    if (this.checking) return this.checking
    this.checking = (async () => {
      const peers = [...this.joinedRooms].map(([peer, room]) => ({ peer, networkId: room.networkId }))
      if (!peers.length) return
      const [current, sessions] = await Promise.all([
        currentMemberships(peers.map(p => ({ networkId: p.networkId, userId: p.peer.userId }))),
        liveSessionIds([...new Set(peers.map(p => p.peer.sessionId))]),
      ])
      for (const { peer, networkId } of peers) {
        const now = current.get(`${networkId} ${peer.userId}`)
        if (!now) peer.close(CLOSE.noAccess, 'no longer a member of this project')
        else if (now.sessionVersion !== peer.sessionVersion || !sessions.has(peer.sessionId)) peer.close(CLOSE.sessionEnded, 'session ended')
        else if (now.role !== peer.role) {
          const wrote = roleWrites(peer.role)
          peer.role = now.role
          if (wrote !== roleWrites(now.role)) peer.close(CLOSE.roleChanged, `role changed to ${now.role}`)
        }
      }
    })().catch((error) => {
      console.warn(`[live] role check failed: ${(error as Error).message}`)
    }).finally(() => { this.checking = null })
    return this.checking
  }

  /** Figures for logs and the benchmark. */
  stats() {
    let accepted = 0
    let dropped = 0
    let refused = 0
    for (const room of this.rooms.values()) {
      accepted += room.stats.accepted
      dropped += room.stats.dropped
      refused += room.stats.refused
    }
    return { rooms: this.rooms.size, peers: this.joinedRooms.size, accepted, dropped, refused }
  }

  /** Shutdown: merge every open room so the JSON documents are current, then stop listening. */
  async stop(): Promise<void> {
    if (this.roleTimer) clearInterval(this.roleTimer)
    const rooms = [...this.rooms.values()]
    this.rooms.clear()
    await Promise.all(rooms.map(async (room) => {
      await room.settle()
      await room.merge({ final: true })
      room.destroy()
    }))
    await Promise.all([...this.closing.values()])
    await this.bus.stop()
  }
}

let hub: LiveHub | null = null

/** The instance's hub, created on first use from the environment. */
export function useLiveHub(): LiveHub {
  if (!hub) {
    const number = (name: string, fallback: number) => {
      const value = Number(process.env[name])
      return Number.isFinite(value) && value > 0 ? value : fallback
    }
    hub = new LiveHub({
      databaseUrl: useRuntimeConfig().databaseUrl || process.env.NUXT_DATABASE_URL || '',
      maxUpdateBytes: number('PORTWRIGHT_LIVE_MAX_UPDATE_BYTES', 1024 * 1024),
      mergeDelayMs: number('PORTWRIGHT_LIVE_MERGE_MS', 2000),
      roleCheckMs: number('PORTWRIGHT_LIVE_ROLE_CHECK_MS', 5000),
    })
    hub.start()
  }
  return hub
}

/** The hub if one was started (shutdown must not start one). */
export function existingLiveHub(): LiveHub | null {
  return hub
}
