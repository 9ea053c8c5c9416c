// npm run demo:disable — locks the demo accounts of the start command's database (random passwords, sessions ended).
import { resolve } from 'node:path'
import { databaseUrl, ensureCluster, isReady, reachableDataDir, startCluster, stopCluster, type Cluster } from './lib/postgres'
import { disableDemoAccounts } from './lib/demo-safety'

const root = resolve(import.meta.dirname, '..')
const dataRoot = resolve(root, process.env.PORTWRIGHT_DATA_DIR ?? '.data')
const cluster: Cluster = { dataDir: reachableDataDir(resolve(dataRoot, 'postgres')), port: Number(process.env.PORTWRIGHT_DB_PORT ?? 54329) }

async function main(): Promise<void> {
  ensureCluster(cluster)
  const own = !isReady(cluster)
  if (own) await startCluster(cluster)
  try {
    const changed = await disableDemoAccounts(databaseUrl(cluster, 'portwright'))
    console.log(changed ? `Disabled ${changed} demo account${changed === 1 ? '' : 's'}: their passwords are now random and their sessions ended.` : 'There are no demo accounts in this database.')
  } finally {
    if (own) stopCluster(cluster)
  }
}

main().catch((error) => {
  console.error(`Could not disable the demo accounts: ${error instanceof Error ? error.message : error}`)
  process.exit(1)
})
