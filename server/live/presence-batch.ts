/**
 * Presence (awareness) changes of a room go out in batches: every change
 * within one short window reaches each peer as one message. Browsers renew
 * their presence every 15 s, and peers that joined together renew together:
 * sent one by one, 200 renewals are 40 000 socket writes in one burst, and the
 * edits that arrive behind it wait half a second.
 */
import * as awarenessProtocol from 'y-protocols/awareness'

/** How long changes gather before they are sent: presence moves at most 20 times a second per room. */
export const PRESENCE_BATCH_MS = 50

export class PresenceBatch {
  private readonly changed = new Set<number>()
  /** Changes made by this instance's peers: only these go on to the other instances. */
  private readonly local = new Set<number>()
  private timer: ReturnType<typeof setTimeout> | null = null

  constructor(
    private readonly windowMs: number,
    private readonly send: (changed: number[], local: number[]) => void,
  ) {}

  add(clients: readonly number[], local: boolean): void {
    for (const id of clients) {
      this.changed.add(id)
      if (local) this.local.add(id)
    }
    if (!this.timer && this.changed.size) this.timer = setTimeout(() => this.flush(), this.windowMs)
  }

  /** Sends what has gathered now. */
  flush(): void {
    if (this.timer) clearTimeout(this.timer)
    this.timer = null
    if (!this.changed.size) return
    const changed = [...this.changed]
    const local = [...this.local]
    this.changed.clear()
    this.local.clear()
    this.send(changed, local)
  }

  /** Drops what has gathered (the room is closing). */
  dispose(): void {
    if (this.timer) clearTimeout(this.timer)
    this.timer = null
    this.changed.clear()
    this.local.clear()
  }
}

/**
 * Splits clients into groups whose awareness update is at most `maxBytes`
 * (one PostgreSQL notification carries one group). A client whose state alone
 * is larger forms a group of its own. Clients the awareness has never seen are left out.
 */
export function presenceGroups(awareness: awarenessProtocol.Awareness, clients: readonly number[], maxBytes: number): number[][] {
  const groups: number[][] = []
  let group: number[] = []
  let size = 0
  for (const id of clients) {
    if (!awareness.meta.has(id)) continue
    // The sum of single-client updates bounds the joint one (each carries a count of one in front).
    const own = awarenessProtocol.encodeAwarenessUpdate(awareness, [id]).length
    if (group.length && size + own > maxBytes) {
      groups.push(group)
      group = []
      size = 0
    }
    group.push(id)
    size += own
  }
  if (group.length) groups.push(group)
  return groups
}
