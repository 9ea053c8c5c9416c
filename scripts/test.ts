import { resolve } from 'node:path'
import { rmSync, mkdirSync, readFileSync, existsSync } from 'node:fs'
import { spawnSync } from 'node:child_process'
import { randomBytes } from 'node:crypto'
import { ensureCluster, startCluster, stopCluster, ensureDatabase, databaseUrl, reachableDataDir, type Cluster } from './lib/postgres'
import { prepareDatabase } from './lib/database-setup'
import { buildIfStale } from './lib/build'
import { startServer, stopProcess } from './lib/server-process'

// The test run's own cluster, port and folders: the start command's data is never touched.
const root = resolve(import.meta.dirname, '..')
// The test data must be reachable by the postgres user; reachableDataDir moves it when it is not.
const testRoot = reachableDataDir(resolve(root, '.data', process.env.PORTWRIGHT_BUILD_NAME ? `test-${process.env.PORTWRIGHT_BUILD_NAME}` : 'test'))
const cluster: Cluster = { dataDir: resolve(testRoot, 'postgres'), port: Number(process.env.PORTWRIGHT_TEST_DB_PORT ?? 54339), unsafeFast: true }
const appPort = Number(process.env.PORTWRIGHT_TEST_PORT ?? 3939)
const resultsFile = resolve(root, 'test-results', process.env.PORTWRIGHT_BUILD_NAME ? `vitest-${process.env.PORTWRIGHT_BUILD_NAME}.json` : 'vitest.json')

/** Whole-project type check (vue-tsc through nuxt), run with the full suite only. */
function typecheck(): boolean {
  console.log('Type-checking (nuxt typecheck)…')
  const result = spawnSync('npx', ['nuxt', 'typecheck'], { cwd: root, stdio: 'inherit' })
  return result.status === 0
}

let typecheckResult: boolean | undefined

async function main(): Promise<number> {
  stopCluster(cluster)
  rmSync(testRoot, { recursive: true, force: true })
  mkdirSync(resolve(root, 'test-results'), { recursive: true })
  ensureCluster(cluster)
  await startCluster(cluster)
  let server: Awaited<ReturnType<typeof startServer>> | undefined
  try {
    await ensureDatabase(cluster, 'portwright')
    const url = databaseUrl(cluster, 'portwright')
    await prepareDatabase(url, { seed: true })
    buildIfStale(root)
    const secret = randomBytes(32).toString('base64url')
    const env = {
      NUXT_DATABASE_URL: url,
      NUXT_SESSION_PASSWORD: secret,
      // Tests stand in for many clients by sending X-Forwarded-For.
      PORTWRIGHT_TRUST_PROXY: '1',
      // A short budget, so the hostile-solve test meets it quickly; honest test networks solve in milliseconds.
      PORTWRIGHT_SOLVE_TIME_LIMIT_MS: '3000',
    }
    server = await startServer(root, env, appPort)
    const vitest = spawnSync('npx', [
      'vitest', 'run', '--config', 'tests/vitest.config.ts',
      '--reporter=default', '--reporter=json', `--outputFile.json=${resultsFile}`,
      ...process.argv.slice(2),
    ], {
      cwd: root,
      stdio: 'inherit',
      env: {
        ...process.env,
        ...env,
        PORTWRIGHT_TEST_URL: `http://127.0.0.1:${appPort}`,
        PORTWRIGHT_TEST_DATABASE_URL: url,
        PORTWRIGHT_TEST_ADMIN_URL: databaseUrl(cluster, 'postgres'),
        PORTWRIGHT_TEST_ROOT: testRoot,
        PORTWRIGHT_TEST_PORT: String(appPort),
        PORTWRIGHT_TEST_DB_PORT: String(cluster.port),
      },
    })
    // A full run also type-checks; a run narrowed by arguments is for quick iteration.
    if (process.argv.length <= 2) typecheckResult = typecheck()
    return typecheckResult === false ? 1 : vitest.status ?? 1
  } finally {
    if (server) await stopProcess(server)
    stopCluster(cluster)
  }
}

/** The plain closing line CI reads: "N passed, N failed". */
function printSummary(): void {
  if (!existsSync(resultsFile)) {
    console.log('0 passed, 1 failed')
    return
  }
  const report = JSON.parse(readFileSync(resultsFile, 'utf8')) as {
    numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number
    testResults?: Array<{ status: string; assertionResults?: Array<{ status: string }> }>
  }
  const skipped = report.numPendingTests + report.numTodoTests
  // A file that fails before its tests run (an error in beforeAll, an import that throws) has no failed test of its
  // own; it still counts as one failure, so the closing line never says "0 failed" for a red run.
  const brokenFiles = (report.testResults ?? []).filter(file => file.status === 'failed' && !(file.assertionResults ?? []).some(a => a.status === 'failed')).length
  // The type check counts as one more check in the closing line.
  const passed = report.numPassedTests + (typecheckResult === true ? 1 : 0)
  const failed = report.numFailedTests + brokenFiles + (typecheckResult === false ? 1 : 0)
  console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`)
}

main()
  .then((code) => { printSummary(); process.exit(code) })
  .catch((error) => {
    console.error(`Test run could not start: ${error instanceof Error ? error.stack : error}`)
    console.log('0 passed, 1 failed')
    process.exit(1)
  })
