/**
 * Sends local edits to co-editors and to the browser's offline copy after the
 * frame instead of inside the edit. Both listen to the document's `update`
 * event, which fires inside the edit's transaction: a slider step would pay
 * for a websocket send and an IndexedDB write before its plot could be drawn.
 * Here they get local updates merged, when the page is next idle (or after
 * `maxDelayMs` at the latest), and updates from anyone else at once, after
 * whatever local ones were waiting, so that their order is kept.
 *
 * Nothing can be lost to the delay: the update is in the document already,
 * the server's sync on reconnect sends whatever it lacks, and `flush()` runs
 * when the page is hidden or closed.
 */
import * as Y from 'yjs'

export type UpdateHandler = (update: Uint8Array, origin: unknown) => void

export interface DeferredUpdates {
  /** Hand every waiting local update to the handlers now. */
  flush(): void
  /** Flush, and give the handlers back their own `update` listeners. */
  dispose(): void
}

export interface DeferOptions {
  /** Updates with these origins (the connection and the offline copy applying what they received) go through at once. */
  immediateOrigins: ReadonlySet<unknown>
  /** Longest wait for an idle moment. @default 100 */
  maxDelayMs?: number
  /** Replaceable in tests: calls `run` once, later. */
  schedule?: (run: () => void, maxDelayMs: number) => void
}

/** The origin merged local updates are handed over with: none of the handlers' own, so none of them skips it. */
export const DEFERRED_ORIGIN = Symbol('deferred local updates')

function idleSchedule(run: () => void, maxDelayMs: number) {
  if (typeof requestIdleCallback === 'function') requestIdleCallback(run, { timeout: maxDelayMs })
  else setTimeout(run, 0)
}

export function deferLocalUpdates(doc: Y.Doc, handlers: readonly UpdateHandler[], options: DeferOptions): DeferredUpdates {
  const schedule = options.schedule ?? idleSchedule
  const maxDelayMs = options.maxDelayMs ?? 100
  let waiting: Uint8Array[] = []
  let scheduled = false

  function flush() {
    if (!waiting.length) return
    const update = waiting.length === 1 ? waiting[0]! : Y.mergeUpdates(waiting)
    waiting = []
    for (const handler of handlers) handler(update, DEFERRED_ORIGIN)
  }
  function onUpdate(update: Uint8Array, origin: unknown) {
    if (options.immediateOrigins.has(origin)) {
      flush()
      for (const handler of handlers) handler(update, origin)
      return
    }
    waiting.push(update)
    if (scheduled) return
    scheduled = true
    schedule(() => {
      scheduled = false
      flush()
    }, maxDelayMs)
  }

  for (const handler of handlers) doc.off('update', handler)
  doc.on('update', onUpdate)
  return {
    flush,
    dispose() {
      flush()
      doc.off('update', onUpdate)
      for (const handler of handlers) doc.on('update', handler)
    },
  }
}
