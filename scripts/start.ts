import { resolve } from 'node:path'
import { ensureCluster, startCluster, stopCluster, ensureDatabase, databaseUrl, isReady, reachableDataDir, type Cluster } from './lib/postgres'
import { prepareDatabase } from './lib/database-setup'
import { buildIfStale } from './lib/build'
import { sessionSecret } from './lib/secret'
import { startServer, stopProcess } from './lib/server-process'
import { startQueueWorkers, stopQueueWorkers, workerCount } from './lib/queue-workers'
import { demoAccountsWithPublishedPassword, demoRefusal, isLoopback } from './lib/demo-safety'

// Everything the start command keeps lives in the git-ignored .data folder.
const root = resolve(import.meta.dirname, '..')
const dataRoot = resolve(root, process.env.PORTWRIGHT_DATA_DIR ?? '.data')
const port = Number(process.env.PORT ?? 3000)
const host = process.env.HOST ?? '127.0.0.1'
const cluster: Cluster = { dataDir: reachableDataDir(resolve(dataRoot, 'postgres')), port: Number(process.env.PORTWRIGHT_DB_PORT ?? 54329) }

async function main() {
  const secret = sessionSecret(resolve(dataRoot, 'session-secret'))
  ensureCluster(cluster)
  let ownCluster = false
  if (!isReady(cluster)) {
    await startCluster(cluster)
    ownCluster = true
  }
  const stopDatabase = () => { if (ownCluster) stopCluster(cluster) }
  try {
    await ensureDatabase(cluster, 'portwright')
    const url = databaseUrl(cluster, 'portwright')
    // Demo accounts have a published password: they are seeded only for an app this machine alone can reach.
    const local = isLoopback(host)
    const { migrated, seeded } = await prepareDatabase(url, { seed: local && process.env.PORTWRIGHT_SEED !== '0' })
    if (migrated.length) console.log(`Applied migrations: ${migrated.join(', ')}`)
    if (seeded) console.log('Loaded the demo data (Quillmere Microwave Lab).')
    if (!local) {
      const open = await demoAccountsWithPublishedPassword(url)
      if (open.length) {
        console.error(demoRefusal(host, open))
        stopDatabase()
        process.exit(1)
      }
    }
    buildIfStale(root)
    const server = await startServer(root, { NUXT_DATABASE_URL: url, NUXT_SESSION_PASSWORD: secret }, port, host)
    // Long tolerance and optimisation runs go to queue workers beside the server (more can run on other machines).
    const workers = startQueueWorkers(root, { NUXT_DATABASE_URL: url }, workerCount())
    if (workers.length) console.log(`Started ${workers.length} queue worker${workers.length === 1 ? '' : 's'} for long runs.`)
    console.log(`\nPortwright is running at http://${host === '0.0.0.0' ? '127.0.0.1' : host}:${port}/  (Ctrl-C stops it and its database)\n`)
    let stopping = false
    const shutdown = async () => {
      if (stopping) return
      stopping = true
      console.log('Stopping Portwright…')
      await Promise.all([stopProcess(server), stopQueueWorkers(workers)])
      stopDatabase()
      process.exit(0)
    }
    process.on('SIGINT', shutdown)
    process.on('SIGTERM', shutdown)
    server.on('exit', (code, signal) => {
      // Ctrl-C in a terminal signals the whole process group, the server included.
      if (stopping || signal === 'SIGINT' || signal === 'SIGTERM') return void shutdown()
      console.error(`The app server stopped unexpectedly (code ${code}).`)
      void stopQueueWorkers(workers).finally(() => {
        stopDatabase()
        process.exit(1)
      })
    })
  } catch (error) {
    stopDatabase()
    throw error
  }
}

main().catch((error) => {
  console.error(`Portwright could not start: ${error instanceof Error ? error.message : error}`)
  process.exit(1)
})
