import pg from 'pg'
import { JOB_PROGRESS_CHANNEL } from '~~/server/jobs/progress-channel'

/** Called with the id of a job of the network that changed, or null when notices may have been missed. */
type JobListener = (jobId: string | null) => void

/**
 * One PostgreSQL connection per app instance LISTENing for job changes, opened with the first page that follows
 * a network's runs. Reconnects with back-off; after every (re)subscribe the listeners are told to read afresh,
 * since notices sent while the connection was down are lost.
 */
class JobProgressListener {
  private client: pg.Client | null = null
  private retryMs = 200
  private readonly listeners = new Map<string, Set<JobListener>>()

  constructor(private readonly url: string) {
    void this.connect()
  }

  subscribe(networkId: string, listener: JobListener): () => void {
    let set = this.listeners.get(networkId)
    if (!set) this.listeners.set(networkId, set = new Set())
    set.add(listener)
    return () => {
      set.delete(listener)
      if (set.size === 0) this.listeners.delete(networkId)
    }
  }

  private async connect(): Promise<void> {
    const client = new pg.Client({ connectionString: this.url })
    this.client = client
    client.on('notification', (message) => {
      const [networkId, jobId] = (message.payload ?? '').split(' ')
      if (networkId && jobId) for (const listener of this.listeners.get(networkId) ?? []) listener(jobId)
    })
    const lost = (error?: Error) => {
      if (this.client !== client) return
      this.client = null
      client.removeAllListeners('notification')
      client.end().catch(() => {})
      console.warn(`[jobs] progress connection lost${error ? ` (${error.message})` : ''}; reconnecting in ${this.retryMs} ms`)
      setTimeout(() => void this.connect(), this.retryMs)
      this.retryMs = Math.min(this.retryMs * 2, 5000)
    }
    client.on('error', lost)
    client.on('end', () => lost())
    try {
      await client.connect()
      await client.query(`LISTEN ${JOB_PROGRESS_CHANNEL}`)
      this.retryMs = 200
      for (const set of this.listeners.values()) for (const listener of set) listener(null)
    } catch (error) {
      lost(error as Error)
    }
  }
}

let listener: JobProgressListener | undefined

/** Follows the job changes of one network; returns the function that stops following. */
export function followJobProgress(networkId: string, onChange: JobListener): () => void {
  if (!listener) {
    const url = useRuntimeConfig().databaseUrl || process.env.NUXT_DATABASE_URL
    if (!url) throw createError({ statusCode: 500, message: 'Database is not configured (NUXT_DATABASE_URL is empty).' })
    listener = new JobProgressListener(url)
  }
  return listener.subscribe(networkId, onChange)
}
