/**
 * Node clients of the live co-editing websocket: y-websocket's own provider
 * over `ws` (Node 20 has no global WebSocket), carrying a signed-in client's
 * session cookie and the app's Origin in the upgrade request.
 */
import WebSocket from 'ws'
import * as Y from 'yjs'
import { WebsocketProvider } from 'y-websocket'
import * as encoding from 'lib0/encoding'
import type { NetworkDocument } from '../../shared/network/types'
import { readNetwork, writeNetwork } from '../../shared/live/network-ydoc'

export interface LiveClient {
  doc: Y.Doc
  provider: WebsocketProvider
  /** Close events seen by this client, newest last. */
  closes: Array<{ code: number, reason: string }>
  read: () => NetworkDocument
  /** One edit as the editor makes it: read, change, write back in one transaction. */
  edit: (change: (d: NetworkDocument) => void) => void
  destroy: () => void
}

/** One awareness (presence) message of the y-websocket protocol, as a client sends it: one state for one client id. */
export function presenceMessage(clientId: number, clock: number, state: unknown): Uint8Array {
  const update = encoding.createEncoder()
  encoding.writeVarUint(update, 1)
  encoding.writeVarUint(update, clientId)
  encoding.writeVarUint(update, clock)
  encoding.writeVarString(update, JSON.stringify(state))
  const message = encoding.createEncoder()
  encoding.writeVarUint(message, 1) // awareness
  encoding.writeVarUint8Array(message, encoding.toUint8Array(update))
  return encoding.toUint8Array(message)
}

/** A `ws` WebSocket class that sends fixed headers (cookie, origin) with the upgrade. */
export function webSocketWithHeaders(headers: Record<string, string>): typeof WebSocket {
  return class extends WebSocket {
    constructor(address: string, protocols?: string | string[]) {
      super(address, protocols, { headers })
    }
  } as typeof WebSocket
}

/** The live address of the app at `baseUrl` (http://host:port). */
export function liveServerUrl(baseUrl: string): string {
  return `${baseUrl.replace(/^http/, 'ws')}/live/networks`
}

/** Connects a live client for one network as the signed-in holder of `cookie`. */
export function liveClient(baseUrl: string, networkId: string, cookie: string, options: { origin?: string } = {}): LiveClient {
  const doc = new Y.Doc()
  const headers: Record<string, string> = { cookie, origin: options.origin ?? baseUrl }
  const provider = new WebsocketProvider(liveServerUrl(baseUrl), networkId, doc, {
    WebSocketPolyfill: webSocketWithHeaders(headers) as unknown as typeof globalThis.WebSocket,
    // Clients in one Node process would otherwise talk over BroadcastChannel and bypass the server.
    disableBc: true,
    maxBackoffTime: 500,
  })
  const closes: Array<{ code: number, reason: string }> = []
  provider.on('connection-close', (event) => { if (event) closes.push({ code: event.code, reason: event.reason }) })
  return {
    doc,
    provider,
    closes,
    read: () => readNetwork(doc),
    edit(change) {
      const next = readNetwork(doc)
      change(next)
      doc.transact(() => writeNetwork(doc, next), 'test-edit')
    },
    destroy() {
      provider.destroy()
      doc.destroy()
    },
  }
}

/** Polls until `check` returns true (or a value), failing with `what` after `timeoutMs`. */
export async function until<T>(what: string, check: () => T | Promise<T>, timeoutMs = 10_000): Promise<NonNullable<T>> {
  const end = Date.now() + timeoutMs
  let last: unknown
  for (;;) {
    try {
      const value = await check()
      if (value) return value as NonNullable<T>
    } catch (error) {
      last = error
    }
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}${last ? ` (${(last as Error).message})` : ''}`)
    await new Promise(r => setTimeout(r, 25))
  }
}

/** Resolves once the client has synced with the server. */
export function synced(client: LiveClient, timeoutMs = 10_000): Promise<boolean> {
  return until('sync', () => client.provider.synced && client.doc.getMap('network').has('v'), timeoutMs)
}

/** Tries a bare upgrade and reports the HTTP status it was refused with (or 101 when it opened). */
export function upgradeStatus(url: string, headers: Record<string, string>): Promise<number> {
  return new Promise((resolve, reject) => {
    const ws = new WebSocket(url, { headers })
    ws.on('unexpected-response', (_req, res) => {
      resolve(res.statusCode ?? 0)
      ws.terminate()
    })
    ws.on('open', () => {
      resolve(101)
      ws.close()
    })
    ws.on('error', (error) => { if (!String(error.message).includes('Unexpected server response')) reject(error) })
  })
}
