/**
 * One dedicated PostgreSQL connection per app instance that LISTENs on the
 * live channels. A notification is a hint, not a guarantee (it is lost while
 * the connection is down), so after every (re)subscribe the handlers run a
 * catch-up read from the tables.
 */
import pg from 'pg'
import { ACCESS_CHANNEL, PRESENCE_CHANNEL, UPDATE_CHANNEL } from './store'

export interface BusHandlers {
  update: (networkId: string, updateId: string, instanceId: string) => void
  presence: (instanceId: string, networkId: string, update: Uint8Array) => void
  access: (projectId: string) => void
  /** After the first subscribe and every re-subscribe: read what notifications may have missed. */
  resubscribed: () => void
}

export class LiveBus {
  private client: pg.Client | null = null
  private stopped = false
  private retryMs = 200

  constructor(private readonly url: string, private readonly handlers: BusHandlers) {}

  start(): void {
    void this.connect()
  }

  private async connect(): Promise<void> {
    if (this.stopped) return
    const client = new pg.Client({ connectionString: this.url })
    this.client = client
    client.on('notification', msg => this.dispatch(msg.channel, msg.payload ?? ''))
    const lost = (error?: Error) => {
      if (this.client !== client) return
      this.client = null
      client.removeAllListeners('notification')
      client.end().catch(() => {})
      if (this.stopped) return
      console.warn(`[live] notification connection lost${error ? ` (${error.message})` : ''}; reconnecting in ${this.retryMs} ms`)
      setTimeout(() => void this.connect(), this.retryMs)
      this.retryMs = Math.min(this.retryMs * 2, 5000)
    }
    client.on('error', lost)
    client.on('end', () => lost())
    try {
      await client.connect()
      await client.query(`LISTEN ${UPDATE_CHANNEL}; LISTEN ${PRESENCE_CHANNEL}; LISTEN ${ACCESS_CHANNEL}`)
      this.retryMs = 200
      this.handlers.resubscribed()
    } catch (error) {
      lost(error as Error)
    }
  }

  private dispatch(channel: string, payload: string): void {
    const parts = payload.split(' ')
    if (channel === UPDATE_CHANNEL && parts.length === 3) this.handlers.update(parts[0]!, parts[1]!, parts[2]!)
    else if (channel === PRESENCE_CHANNEL && parts.length === 3) this.handlers.presence(parts[0]!, parts[1]!, new Uint8Array(Buffer.from(parts[2]!, 'base64')))
    else if (channel === ACCESS_CHANNEL) this.handlers.access(payload)
  }

  async stop(): Promise<void> {
    this.stopped = true
    const client = this.client
    this.client = null
    await client?.end().catch(() => {})
  }
}
