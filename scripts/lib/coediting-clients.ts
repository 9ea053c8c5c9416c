/**
 * One load-generator process of the co-editing benchmark (scripts/bench-coediting.ts
 * forks several, so that 200 full Yjs clients do not share one event loop).
 * It opens its share of the clients, reports when they are synced, edits on
 * the common schedule for its own writers, and sends back what it sent and
 * received with wall-clock times, from which the parent computes latencies.
 */
import { monitorEventLoopDelay } from 'node:perf_hooks'
import * as Y from 'yjs'
import { WebsocketProvider } from 'y-websocket'
import WebSocket from 'ws'
import { readNetwork, writeNetwork } from '../../shared/live/network-ydoc'
import { presenceMessage, webSocketWithHeaders } from '../../tests/support/live'

export interface ClientsPlan {
  cookie: string
  bases: string[]
  networkId: string
  /** Client numbers this process runs (client i connects to instance i mod instances). */
  clients: number[]
  writerCount: number
  variableSlots: number
  light: boolean
  rate: number
  seconds: number
}

export interface ClientsResult {
  /** Edits sent: value token and wall-clock time (ms). */
  sent: Array<[string, number]>
  /** Edits received: token, receiving client, wall-clock time (ms). */
  received: { tokens: string[], clients: number[], times: number[] }
  closes: string[]
  cpuShareOfOneCore: number
  eventLoopDelayMs: { p99: number, max: number }
}

export type ToClients = { type: 'plan', plan: ClientsPlan } | { type: 'go', startAt: number } | { type: 'stop' }
export type FromClients = { type: 'ready' } | { type: 'result', result: ClientsResult } | { type: 'failed', message: string }

/** Wall-clock milliseconds with sub-millisecond resolution, comparable between processes. */
const now = () => performance.timeOrigin + performance.now()

function send(message: FromClients): void {
  process.send!(message)
}

async function run(plan: ClientsPlan): Promise<void> {
  const sent: Array<[string, number]> = []
  const received: ClientsResult['received'] = { tokens: [], clients: [], times: [] }
  const closes: string[] = []
  let started = false
  const record = (token: string, client: number, time: number) => {
    received.tokens.push(token)
    received.clients.push(client)
    received.times.push(time)
  }
  const docs = new Map<number, Y.Doc>()
  const providers: WebsocketProvider[] = []
  const lightSockets: WebSocket[] = []
  const timers: Array<ReturnType<typeof setInterval>> = []
  const home = (i: number) => plan.bases[i % plan.bases.length]!

  for (const i of plan.clients) {
    if (plan.light && i >= plan.writerCount) {
      const socket = new WebSocket(`${home(i).replace('http', 'ws')}/live/networks/${plan.networkId}`, { headers: { cookie: plan.cookie, origin: home(i) } })
      socket.binaryType = 'nodebuffer'
      socket.on('message', (data: Buffer) => {
        const time = now()
        // An edit's value travels as a Yjs string: type byte 119 ('w'), its length, then the text.
        for (const m of data.toString('latin1').matchAll(/w([\s\S])(\d+:\d+)/g)) {
          if (m[1]!.charCodeAt(0) === m[2]!.length) record(m[2]!, i, time)
        }
      })
      socket.on('close', (code: number, reason: Buffer) => { if (started) closes.push(`client ${i}: ${code} ${reason.toString()}`.trim()) })
      const clientId = 1_000_000 + i
      let clock = 0
      const presence = () => {
        if (socket.readyState === WebSocket.OPEN) socket.send(presenceMessage(clientId, ++clock, {}))
      }
      socket.on('open', presence)
      timers.push(setInterval(presence, 15_000))
      lightSockets.push(socket)
      continue
    }
    const doc = new Y.Doc()
    const provider = new WebsocketProvider(`${home(i).replace('http', 'ws')}/live/networks`, plan.networkId, doc, {
      WebSocketPolyfill: webSocketWithHeaders({ cookie: plan.cookie, origin: home(i) }) as unknown as typeof globalThis.WebSocket,
      disableBc: true,
    })
    provider.on('connection-close', (event: { code: number, reason: string } | null) => {
      if (started) closes.push(`client ${i}: ${event?.code ?? '?'} ${event?.reason ?? ''}`.trim())
    })
    const seen = new Map<string, unknown>()
    const ownPrefix = `${i}:`
    doc.on('update', (_u: Uint8Array, origin: unknown) => {
      if (origin !== provider) return
      const time = now()
      // Straight to the variables' value map (see shared/live/network-ydoc.ts): the receiving side of
      // the measurement should cost the load generator as little as possible.
      const vars = ((doc.getMap('network').get('v') as Y.Map<unknown>).get('variables') as Y.Map<unknown>).get('v') as Y.Map<unknown>
      for (const [key, value] of vars.entries()) {
        if (!key.startsWith('c') || seen.get(key) === value) continue
        seen.set(key, value)
        // A client's own value, written locally; counting it here would time the next remote update instead.
        if (String(value).startsWith(ownPrefix)) continue
        record(String(value), i, time)
      }
    })
    docs.set(i, doc)
    providers.push(provider)
  }
  const deadline = Date.now() + 30_000
  while (!providers.every(p => p.synced) || !lightSockets.every(s => s.readyState === WebSocket.OPEN)) {
    if (Date.now() > deadline) throw new Error('clients did not sync within 30 s')
    await new Promise(r => setTimeout(r, 50))
  }
  const startAt = await new Promise<number>((done) => {
    process.on('message', (message: ToClients) => { if (message.type === 'go') done(message.startAt) })
    send({ type: 'ready' })
  })

  const loopDelay = monitorEventLoopDelay({ resolution: 10 })
  loopDelay.enable()
  const cpuAtStart = process.cpuUsage()
  const wallAtStart = now()
  started = true
  const total = Math.round(plan.rate * plan.seconds)
  const interval = 1000 / plan.rate
  for (let n = 0; n < total; n++) {
    const i = n % plan.writerCount
    const doc = docs.get(i)
    if (!doc) continue
    const wait = startAt + n * interval - now()
    if (wait > 0) await new Promise(r => setTimeout(r, wait))
    const token = `${i}:${n}`
    const next = readNetwork(doc)
    next.variables = { ...next.variables, [`c${i % plan.variableSlots}`]: token }
    sent.push([token, now()])
    doc.transact(() => writeNetwork(doc, next))
  }
  // Late deliveries still count: wait until two seconds after the last edit of the whole schedule.
  const end = startAt + total * interval + 2000
  await new Promise(r => setTimeout(r, Math.max(0, end - now())))
  loopDelay.disable()
  const cpu = process.cpuUsage(cpuAtStart)
  started = false
  send({
    type: 'result',
    result: {
      sent,
      received,
      closes,
      cpuShareOfOneCore: (cpu.user + cpu.system) / 1000 / (now() - wallAtStart),
      eventLoopDelayMs: { p99: loopDelay.percentile(99) / 1e6, max: loopDelay.max / 1e6 },
    },
  })
  await new Promise<void>((done) => { process.on('message', (message: ToClients) => { if (message.type === 'stop') done() }) })
  for (const t of timers) clearInterval(t)
  for (const s of lightSockets) s.close()
  for (const p of providers) {
    p.destroy()
    p.awareness.destroy()
  }
  // Closing frames go out before the process ends; the last client out triggers the server's final merge.
  await new Promise(r => setTimeout(r, 500))
  process.exit(0)
}

process.once('message', (message: ToClients) => {
  if (message.type !== 'plan') return
  run(message.plan).catch((error) => {
    send({ type: 'failed', message: error instanceof Error ? error.stack ?? error.message : String(error) })
    process.exit(1)
  })
})
