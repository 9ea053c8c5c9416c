/**
 * Load benchmark of live co-editing (not a test: it prints figures). Starts its
 * own PostgreSQL cluster (safe defaults, fsync on) and the built app, opens 50
 * y-websocket clients on one network and has them edit at 20 updates per second
 * in total for 60 s on loopback. Reports the latency from an edit at one client
 * to its arrival at each of the others (p50, p95, max), the server's resident
 * memory, and the rows the database wrote.
 *
 *   PORTWRIGHT_BUILD_NAME=live npx tsx scripts/bench-coediting.ts [--clients 50] [--rate 20] [--seconds 60]
 *
 * PORTWRIGHT_BENCH_PORT (default 5960) and PORTWRIGHT_BENCH_DB_PORT (default 56360) choose the ports.
 */
import { readFileSync, rmSync } from 'node:fs'
import { randomBytes } from 'node:crypto'
import { loadavg } from 'node:os'
import { resolve } from 'node:path'
import pg from 'pg'
import * as Y from 'yjs'
import { WebsocketProvider } from 'y-websocket'
import { ensureCluster, startCluster, stopCluster, ensureDatabase, databaseUrl, type Cluster } from './lib/postgres'
import { prepareDatabase } from './lib/database-setup'
import { buildIfStale } from './lib/build'
import { startServer, stopProcess } from './lib/server-process'
import { readNetwork, writeNetwork } from '../shared/live/network-ydoc'
import { webSocketWithHeaders } from '../tests/support/live'

function arg(name: string, fallback: number): number {
  const at = process.argv.indexOf(`--${name}`)
  return at > 0 ? Number(process.argv[at + 1]) : fallback
}

const clientCount = arg('clients', 50)
const rate = arg('rate', 20)
const seconds = arg('seconds', 60)
const root = resolve(import.meta.dirname, '..')
const appPort = Number(process.env.PORTWRIGHT_BENCH_PORT ?? 5960)
const dataDir = resolve(root, '.data', `bench-coediting${process.env.PORTWRIGHT_BUILD_NAME ? `-${process.env.PORTWRIGHT_BUILD_NAME}` : ''}`)
const cluster: Cluster = { dataDir: resolve(dataDir, 'postgres'), port: Number(process.env.PORTWRIGHT_BENCH_DB_PORT ?? 56360) }
const base = `http://127.0.0.1:${appPort}`

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!
}

function rssMiB(pid: number): number {
  const line = readFileSync(`/proc/${pid}/status`, 'utf8').split('\n').find(l => l.startsWith('VmRSS:'))
  return line ? Number(line.replace(/\D+/g, '')) / 1024 : NaN
}

async function signIn(): Promise<string> {
  const response = await fetch(`${base}/api/auth/signin`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: 'ines@quillmere.example', password: 'quillmere-demo-2026' }),
  })
  if (!response.ok) throw new Error(`sign-in failed: ${response.status}`)
  return response.headers.getSetCookie().map(c => c.split(';')[0]).join('; ')
}

async function api<T>(cookie: string, path: string, body?: unknown): Promise<T> {
  const response = await fetch(`${base}${path}`, {
    method: body ? 'POST' : 'GET',
    headers: { cookie, origin: base, ...(body ? { 'content-type': 'application/json' } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  })
  if (!response.ok) throw new Error(`${path}: ${response.status}`)
  return response.json() as Promise<T>
}

async function tableCounters(db: pg.Client) {
  const rows = await db.query<{ relname: string, ins: string, upd: string, del: string }>(
    `SELECT relname, n_tup_ins AS ins, n_tup_upd AS upd, n_tup_del AS del FROM pg_stat_user_tables
      WHERE relname IN ('network_updates', 'network_live_states', 'networks')`,
  )
  return Object.fromEntries(rows.rows.map(r => [r.relname, { inserted: Number(r.ins), updated: Number(r.upd), deleted: Number(r.del) }]))
}

async function main(): Promise<void> {
  stopCluster(cluster)
  rmSync(dataDir, { recursive: true, force: true })
  ensureCluster(cluster)
  await startCluster(cluster)
  let server: Awaited<ReturnType<typeof startServer>> | undefined
  const providers: WebsocketProvider[] = []
  try {
    await ensureDatabase(cluster, 'portwright')
    const url = databaseUrl(cluster, 'portwright')
    await prepareDatabase(url, { seed: true })
    buildIfStale(root)
    server = await startServer(root, { NUXT_DATABASE_URL: url, NUXT_SESSION_PASSWORD: randomBytes(32).toString('base64url') }, appPort)
    const pid = server.pid!
    const cookie = await signIn()
    const projects = await api<Array<{ id: string, name: string }>>(cookie, '/api/projects')
    const project = projects.find(p => p.name.startsWith('Beam-switch')) ?? projects[0]!
    const network = await api<{ id: string }>(cookie, `/api/projects/${project.id}/networks`, { name: `Co-editing load ${Date.now()}` })

    const sentAt = new Map<string, number>()
    const latencies: number[] = []
    const docs: Y.Doc[] = []
    for (let i = 0; i < clientCount; i++) {
      const doc = new Y.Doc()
      const provider = new WebsocketProvider(`${base.replace('http', 'ws')}/live/networks`, network.id, doc, {
        WebSocketPolyfill: webSocketWithHeaders({ cookie, origin: base }) as unknown as typeof globalThis.WebSocket,
        disableBc: true,
      })
      const seen = new Map<string, unknown>()
      const own = `c${i}`
      doc.on('update', (_u: Uint8Array, origin: unknown) => {
        if (origin !== provider) return
        const received = performance.now()
        // Straight to the variables' value map (see shared/live/network-ydoc.ts): the receiving side of
        // the measurement should cost the load generator as little as possible.
        const vars = ((doc.getMap('network').get('v') as Y.Map<unknown>).get('variables') as Y.Map<unknown>).get('v') as Y.Map<unknown>
        for (const [key, value] of vars.entries()) {
          // A client's own variable changed locally; counting it here would time the next remote update instead.
          if (key === own || !key.startsWith('c') || seen.get(key) === value) continue
          seen.set(key, value)
          const t0 = sentAt.get(String(value))
          if (t0 !== undefined) latencies.push(received - t0)
        }
      })
      docs.push(doc)
      providers.push(provider)
    }
    const deadline = Date.now() + 20_000
    while (!providers.every(p => p.synced)) {
      if (Date.now() > deadline) throw new Error('clients did not sync within 20 s')
      await new Promise(r => setTimeout(r, 50))
    }
    const db = new pg.Client({ connectionString: url })
    await db.connect()
    const before = await tableCounters(db)
    const rss: number[] = [rssMiB(pid)]
    const memTimer = setInterval(() => rss.push(rssMiB(pid)), 1000)

    const total = Math.round(rate * seconds)
    const interval = 1000 / rate
    const start = performance.now()
    for (let n = 0; n < total; n++) {
      const wait = start + n * interval - performance.now()
      if (wait > 0) await new Promise(r => setTimeout(r, wait))
      const i = n % clientCount
      const doc = docs[i]!
      const token = `${i}:${n}`
      const next = readNetwork(doc)
      next.variables = { ...next.variables, [`c${i}`]: token }
      sentAt.set(token, performance.now())
      doc.transact(() => writeNetwork(doc, next))
    }
    await new Promise(r => setTimeout(r, 2000))
    clearInterval(memTimer)
    const expected = total * (clientCount - 1)
    for (const p of providers) p.destroy()
    // The last client out triggers the final merge; give it a moment before reading the counters.
    await new Promise(r => setTimeout(r, 3000))
    const after = await tableCounters(db)
    // Context for the latency: every update waits for one committed insert before it is sent on.
    // An ordinary table: inserts into a temporary one write no WAL and so never wait for a flush.
    await db.query('CREATE TABLE bench_commit_probe (data bytea)')
    const commits: number[] = []
    for (let k = 0; k < 200; k++) {
      const t0 = performance.now()
      await db.query('INSERT INTO bench_commit_probe VALUES ($1)', [Buffer.alloc(64)])
      commits.push(performance.now() - t0)
    }
    commits.sort((a, b) => a - b)
    await db.query('DROP TABLE bench_commit_probe')
    await db.end()

    latencies.sort((a, b) => a - b)
    const delta = (table: string, field: 'inserted' | 'updated' | 'deleted') => (after[table]?.[field] ?? 0) - (before[table]?.[field] ?? 0)
    const result = {
      clients: clientCount,
      updatesPerSecond: rate,
      seconds,
      updatesSent: total,
      deliveries: latencies.length,
      deliveriesExpected: expected,
      latencyMs: { p50: +percentile(latencies, 50).toFixed(2), p95: +percentile(latencies, 95).toFixed(2), max: +(latencies.at(-1) ?? NaN).toFixed(2) },
      commitMs: { p50: +percentile(commits, 50).toFixed(2), p95: +percentile(commits, 95).toFixed(2) },
      serverRssMiB: { start: +rss[0]!.toFixed(1), peak: +Math.max(...rss).toFixed(1), end: +rss.at(-1)!.toFixed(1) },
      databaseRows: {
        updateLogInserted: delta('network_updates', 'inserted'),
        updateLogDeleted: delta('network_updates', 'deleted'),
        liveStateUpdated: delta('network_live_states', 'updated'),
        networksUpdated: delta('networks', 'updated'),
      },
    }
    console.log(`latency send → other clients: p50 ${result.latencyMs.p50} ms, p95 ${result.latencyMs.p95} ms, max ${result.latencyMs.max} ms (${result.deliveries} of ${expected} deliveries)`)
    console.log(`one committed insert from this client: p50 ${result.commitMs.p50} ms, p95 ${result.commitMs.p95} ms; load average ${loadavg().map(l => l.toFixed(1)).join(' ')}`)
    console.log(`server memory (RSS): ${result.serverRssMiB.start} MiB at start, ${result.serverRssMiB.peak} MiB peak, ${result.serverRssMiB.end} MiB at end`)
    console.log(`database rows: ${result.databaseRows.updateLogInserted} update-log inserts, ${result.databaseRows.updateLogDeleted} deleted by merges, ${result.databaseRows.liveStateUpdated} state merges, ${result.databaseRows.networksUpdated} JSON document writes`)
    console.log(JSON.stringify(result))
  } finally {
    // The providers' presence timers would keep Node running after the figures are out.
    for (const p of providers) {
      p.destroy()
      p.awareness.destroy()
    }
    if (server) await stopProcess(server)
    stopCluster(cluster)
  }
}

main().then(() => process.exit(0)).catch((error) => {
  console.error(`Benchmark failed: ${error instanceof Error ? error.stack : error}`)
  process.exit(1)
})
