/**
 * Load benchmark of live co-editing (not a test: it prints figures). Starts its
 * own PostgreSQL cluster (safe defaults, fsync on) and the built app (one or
 * more instances on one database), opens y-websocket clients on one network,
 * spread over the instances in turn, and has them edit at a total rate for a
 * while on loopback. Reports the latency from an edit at one client to its
 * arrival at each of the others (p50, p95, p99, max), each instance's resident
 * memory, errors (closed connections, missing deliveries, server warnings),
 * each load-generator process's CPU use and event-loop delay, the rows the
 * database wrote, and the updates that arrived late, by how many receivers.
 *
 *   PORTWRIGHT_BUILD_NAME=live npx tsx scripts/bench-coediting.ts [--clients 50] [--rate 20] [--seconds 60] [--instances 1] [--writers N] [--light] [--processes 1] [--profile]
 *
 * --writers N: only the first N clients edit (all of them by default); the
 * others only receive. --light: those receiving-only clients are bare
 * websockets that keep no Yjs document (they find each edit's value in the
 * bytes they receive and renew a presence every 15 s, as a browser does), so
 * that hundreds of them cost the load generator little: the server does the
 * same work for them as for full clients. --processes N: the clients run in N
 * load-generator processes (client i in process i mod N), each its own event
 * loop; latencies are taken from wall-clock times, sent and received.
 *
 * PORTWRIGHT_BENCH_PORT (default 5960; instance k listens on port + k) and
 * PORTWRIGHT_BENCH_DB_PORT (default 56360) choose the ports. --profile runs the
 * servers under `node --cpu-prof` and prints where their CPU time went.
 */
import { readFileSync, rmSync } from 'node:fs'
import { randomBytes } from 'node:crypto'
import { loadavg } from 'node:os'
import { resolve } from 'node:path'
import { fork, type ChildProcess } from 'node:child_process'
import pg from 'pg'
import { ensureCluster, startCluster, stopCluster, ensureDatabase, databaseUrl, type Cluster } from './lib/postgres'
import { prepareDatabase } from './lib/database-setup'
import { buildIfStale } from './lib/build'
import { startServer, stopProcess } from './lib/server-process'
import type { ClientsPlan, ClientsResult, FromClients, ToClients } from './lib/coediting-clients'
import { summariseCpuProfiles } from './lib/cpu-profile-summary'

function arg(name: string, fallback: number): number {
  const at = process.argv.indexOf(`--${name}`)
  return at > 0 ? Number(process.argv[at + 1]) : fallback
}

const clientCount = arg('clients', 50)
const rate = arg('rate', 20)
const seconds = arg('seconds', 60)
const instanceCount = Math.max(1, Math.floor(arg('instances', 1)))
const profile = process.argv.includes('--profile')
/**
 * Each client writes its own variable, but the contract allows at most 200 per
 * network: past 100 clients, two clients share one (they write it
 * `clients` updates apart, so never at the same time).
 */
const writerCount = Math.min(clientCount, Math.max(1, Math.floor(arg('writers', clientCount))))
const light = process.argv.includes('--light')
/** Load-generator processes: one event loop for 200 full Yjs clients falls behind, and would time itself. */
const processCount = Math.max(1, Math.min(clientCount, Math.floor(arg('processes', 1))))
const variableSlots = Math.min(writerCount, 100)
const root = resolve(import.meta.dirname, '..')
const appPort = Number(process.env.PORTWRIGHT_BENCH_PORT ?? 5960)
const dataDir = resolve(root, '.data', `bench-coediting${process.env.PORTWRIGHT_BUILD_NAME ? `-${process.env.PORTWRIGHT_BUILD_NAME}` : ''}`)
const cluster: Cluster = { dataDir: resolve(dataDir, 'postgres'), port: Number(process.env.PORTWRIGHT_BENCH_DB_PORT ?? 56360) }
const bases = Array.from({ length: instanceCount }, (_, k) => `http://127.0.0.1:${appPort + k}`)
const base = bases[0]!
const profileDir = resolve(dataDir, 'cpu-profiles')

interface Generator {
  process: ChildProcess
  ready: Promise<void>
  result: Promise<ClientsResult>
  exited: Promise<void>
}

function deferred<T>() {
  let resolve!: (value: T) => void
  let reject!: (error: Error) => void
  const promise = new Promise<T>((yes, no) => { resolve = yes; reject = no })
  return { promise, resolve, reject }
}

/** Forks one load-generator process (scripts/lib/coediting-clients.ts) and hands it its clients. */
function startGenerator(plan: ClientsPlan): Generator {
  const child = fork(resolve(import.meta.dirname, 'lib', 'coediting-clients.ts'), [], { execArgv: ['--import', 'tsx'], cwd: root })
  const exited = new Promise<void>(done => child.once('exit', () => done()))
  const ready = deferred<void>()
  const result = deferred<ClientsResult>()
  // Either may fail before anyone awaits it; once settled, a later failure changes nothing.
  ready.promise.catch(() => {})
  result.promise.catch(() => {})
  const fail = (error: Error) => { ready.reject(error); result.reject(error) }
  child.on('message', (message: FromClients) => {
    if (message.type === 'ready') ready.resolve()
    else if (message.type === 'result') result.resolve(message.result)
    else fail(new Error(`load generator failed: ${message.message}`))
  })
  child.once('exit', code => fail(new Error(`load generator exited (${code}) before its result`)))
  child.send({ type: 'plan', plan } satisfies ToClients)
  return { process: child, ready: ready.promise, result: result.promise, exited }
}

/** A delivery slower than this is listed by update in the report. */
const SLOW_MS = 100

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

/**
 * Late deliveries grouped by update. An update late at most of its receivers
 * was held before the fan-out (a pause of the server, the database or this
 * process); one late at a few was held on those connections.
 */
function reportSlow(slow: Map<string, Array<{ client: number, ms: number }>>, sentAt: Map<string, number>, start: number, receivers: number): void {
  const updates = [...slow.entries()].map(([token, list]) => ({ token, at: (sentAt.get(token)! - start) / 1000, late: list.length, max: Math.max(...list.map(d => d.ms)) }))
  const total = updates.reduce((n, u) => n + u.late, 0)
  if (!total) return console.log(`deliveries over ${SLOW_MS} ms: none`)
  const wide = updates.filter(u => u.late > receivers / 2)
  const perClient = new Map<number, number>()
  for (const list of slow.values()) for (const d of list) perClient.set(d.client, (perClient.get(d.client) ?? 0) + 1)
  const clients = [...perClient.entries()].sort((a, b) => b[1] - a[1])
  console.log(`deliveries over ${SLOW_MS} ms: ${total} of ${updates.length} updates; ${wide.reduce((n, u) => n + u.late, 0)} of them in ${wide.length} updates late at more than half their receivers; ${clients.length} clients had one or more, most ${clients.slice(0, 5).map(([c, n]) => `client ${c}: ${n}`).join(', ')}`)
  for (const u of updates.sort((a, b) => a.at - b.at).slice(0, 40)) console.log(`  at ${u.at.toFixed(2)} s update ${u.token}: late at ${u.late} of ${receivers}, max ${u.max.toFixed(0)} ms`)
}

async function main(): Promise<void> {
  stopCluster(cluster)
  rmSync(dataDir, { recursive: true, force: true })
  ensureCluster(cluster)
  await startCluster(cluster)
  const servers: ChildProcess[] = []
  const generators: Generator[] = []
  try {
    await ensureDatabase(cluster, 'portwright')
    const url = databaseUrl(cluster, 'portwright')
    await prepareDatabase(url, { seed: true })
    buildIfStale(root)
    // One session secret for all instances: a cookie from one is good on the others, as behind a load balancer.
    const env = { NUXT_DATABASE_URL: url, NUXT_SESSION_PASSWORD: randomBytes(32).toString('base64url') }
    const serverWarnings: string[] = []
    const nodeArgs = profile ? ['--cpu-prof', `--cpu-prof-dir=${profileDir}`] : []
    for (let k = 0; k < instanceCount; k++) {
      servers.push(await startServer(root, env, appPort + k, '127.0.0.1', {
        nodeArgs,
        onStderr: (line) => { if (/\[live\]|error/i.test(line)) serverWarnings.push(`instance ${k + 1}: ${line}`) },
      }))
    }
    const pids = servers.map(s => s.pid!)
    const cookie = await signIn()
    const projects = await api<Array<{ id: string, name: string }>>(cookie, '/api/projects')
    const project = projects.find(p => p.name.startsWith('Beam-switch')) ?? projects[0]!
    const network = await api<{ id: string }>(cookie, `/api/projects/${project.id}/networks`, { name: `Co-editing load ${Date.now()}` })

    const latencies: number[] = []
    /** Deliveries over SLOW_MS, per update: which clients got it late tells a pause of the server from a slow connection. */
    const slow = new Map<string, Array<{ client: number, ms: number }>>()
    const deliver = (token: string, client: number, ms: number) => {
      latencies.push(ms)
      if (ms <= SLOW_MS) return
      const list = slow.get(token) ?? []
      list.push({ client, ms })
      slow.set(token, list)
    }
    // Client i runs in generator process i mod processes, so writers and receivers are spread over them all.
    const plans: ClientsPlan[] = Array.from({ length: processCount }, (_, k) => ({
      cookie, bases, networkId: network.id, writerCount, variableSlots, light, rate, seconds,
      clients: Array.from({ length: clientCount }, (_, i) => i).filter(i => i % processCount === k),
    }))
    for (const plan of plans) generators.push(startGenerator(plan))
    await Promise.all(generators.map(g => g.ready))
    const db = new pg.Client({ connectionString: url })
    await db.connect()
    const before = await tableCounters(db)
    const rss: number[][] = pids.map(pid => [rssMiB(pid)])
    const memTimer = setInterval(() => pids.forEach((pid, k) => rss[k]!.push(rssMiB(pid))), 1000)
    const loadAtStart = loadavg()
    const startAt = performance.timeOrigin + performance.now() + 500
    for (const g of generators) g.process.send({ type: 'go', startAt } satisfies ToClients)
    const outcomes = await Promise.all(generators.map(g => g.result))
    clearInterval(memTimer)
    const loadAtEnd = loadavg()
    const total = Math.round(rate * seconds)
    const expected = total * (clientCount - 1)
    const sentAt = new Map(outcomes.flatMap(o => o.sent))
    for (const o of outcomes) {
      o.received.tokens.forEach((token, k) => {
        const t0 = sentAt.get(token)
        if (t0 !== undefined) deliver(token, o.received.clients[k]!, o.received.times[k]! - t0)
      })
    }
    const closes = outcomes.flatMap(o => o.closes)
    for (const g of generators) g.process.send({ type: 'stop' } satisfies ToClients)
    await Promise.all(generators.map(g => g.exited))
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
      instances: instanceCount,
      clients: clientCount,
      writers: writerCount,
      receivers: light ? 'light' : 'full',
      updatesPerSecond: rate,
      seconds,
      updatesSent: total,
      deliveries: latencies.length,
      deliveriesExpected: expected,
      latencyMs: { p50: +percentile(latencies, 50).toFixed(2), p95: +percentile(latencies, 95).toFixed(2), p99: +percentile(latencies, 99).toFixed(2), max: +(latencies.at(-1) ?? NaN).toFixed(2) },
      errors: { connectionsClosed: closes.length, deliveriesMissing: expected - latencies.length, serverWarnings: serverWarnings.length },
      loadGenerator: outcomes.map(o => ({ cpuShareOfOneCore: +o.cpuShareOfOneCore.toFixed(2), eventLoopDelayMs: { p99: +o.eventLoopDelayMs.p99.toFixed(1), max: +o.eventLoopDelayMs.max.toFixed(1) } })),
      loadAverage: { start: loadAtStart.map(l => +l.toFixed(2)), end: loadAtEnd.map(l => +l.toFixed(2)) },
      commitMs: { p50: +percentile(commits, 50).toFixed(2), p95: +percentile(commits, 95).toFixed(2) },
      serverRssMiB: rss.map(r => ({ start: +r[0]!.toFixed(1), peak: +Math.max(...r).toFixed(1), end: +r.at(-1)!.toFixed(1) })),
      databaseRows: {
        updateLogInserted: delta('network_updates', 'inserted'),
        updateLogDeleted: delta('network_updates', 'deleted'),
        liveStateUpdated: delta('network_live_states', 'updated'),
        networksUpdated: delta('networks', 'updated'),
      },
    }
    console.log(`${clientCount} clients (${writerCount} editing; ${light && writerCount < clientCount ? 'the others bare websockets' : 'all Yjs clients'}) on ${instanceCount} instance(s), ${rate} updates/s for ${seconds} s`)
    console.log(`latency send → other clients: p50 ${result.latencyMs.p50} ms, p95 ${result.latencyMs.p95} ms, p99 ${result.latencyMs.p99} ms, max ${result.latencyMs.max} ms (${result.deliveries} of ${expected} deliveries)`)
    console.log(`errors: ${result.errors.connectionsClosed} connections closed, ${result.errors.deliveriesMissing} deliveries missing, ${result.errors.serverWarnings} server warnings`)
    for (const w of serverWarnings.slice(0, 5)) console.log(`  ${w}`)
    for (const c of closes.slice(0, 5)) console.log(`  ${c}`)
    console.log(`one committed insert from this client: p50 ${result.commitMs.p50} ms, p95 ${result.commitMs.p95} ms`)
    console.log(`load average: ${result.loadAverage.start.join(' ')} at start, ${result.loadAverage.end.join(' ')} at end; load generator (${processCount} process${processCount > 1 ? 'es' : ''}): ${result.loadGenerator.map(g => `${Math.round(100 * g.cpuShareOfOneCore)} % of one core, event-loop delay p99 ${g.eventLoopDelayMs.p99} ms, max ${g.eventLoopDelayMs.max} ms`).join('; ')}`)
    result.serverRssMiB.forEach((r, k) => console.log(`server ${k + 1} memory (RSS): ${r.start} MiB at start, ${r.peak} MiB peak, ${r.end} MiB at end`))
    console.log(`database rows: ${result.databaseRows.updateLogInserted} update-log inserts, ${result.databaseRows.updateLogDeleted} deleted by merges, ${result.databaseRows.liveStateUpdated} state merges, ${result.databaseRows.networksUpdated} JSON document writes`)
    reportSlow(slow, sentAt, startAt, clientCount - 1)
    console.log(JSON.stringify(result))
  } finally {
    for (const g of generators) g.process.kill()
    await Promise.all(servers.map(s => stopProcess(s, 15_000)))
    if (profile) summariseCpuProfiles(profileDir)
    stopCluster(cluster)
  }
}

main().then(() => process.exit(0)).catch((error) => {
  console.error(`Benchmark failed: ${error instanceof Error ? error.stack : error}`)
  process.exit(1)
})
