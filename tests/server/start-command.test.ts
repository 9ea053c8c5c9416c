import { spawn, spawnSync, type ChildProcess } from 'node:child_process'
import { chmodSync, mkdtempSync, readFileSync, rmSync } from 'node:fs'
import { join } from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'

/**
 * The start command end to end, on a data folder and ports of its own: first
 * start creates the cluster, migrates and seeds; a second start reuses all of it.
 */
const root = process.cwd()
const dataDir = mkdtempSync(join(process.env.PORTWRIGHT_TEST_ROOT!, 'start-'))
// mkdtemp makes a mode-700 folder; the database runs as the postgres user and must reach inside.
chmodSync(dataDir, 0o755)
// Offsets from the test run's own ports, so that parallel runs (PORTWRIGHT_BUILD_NAME) do not collide.
const port = Number(process.env.PORTWRIGHT_TEST_PORT) + 22
const dbPort = Number(process.env.PORTWRIGHT_TEST_DB_PORT) + 22
const url = `http://127.0.0.1:${port}`

function start(extra: Record<string, string> = {}): Promise<{ child: ChildProcess; output: () => string }> {
  const env = { ...process.env, PORT: String(port), PORTWRIGHT_DB_PORT: String(dbPort), PORTWRIGHT_DATA_DIR: dataDir, ...extra }
  delete env.NUXT_SESSION_PASSWORD
  delete env.NUXT_DATABASE_URL
  const child = spawn(process.execPath, ['--import', 'tsx', 'scripts/start.ts'], { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] })
  let text = ''
  child.stdout!.on('data', (d) => { text += d })
  child.stderr!.on('data', (d) => { text += d })
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`start timed out:\n${text}`)), 90_000)
    child.stdout!.on('data', () => {
      if (text.includes('Portwright is running at')) { clearTimeout(timer); resolve({ child, output: () => text }) }
    })
    child.on('exit', (code) => { clearTimeout(timer); reject(new Error(`start exited with ${code}:\n${text}`)) })
  })
}

function stop(child: ChildProcess): Promise<number | null> {
  return new Promise((resolve) => {
    child.removeAllListeners('exit')
    child.once('exit', code => resolve(code))
    child.kill('SIGTERM')
  })
}

async function signIn(): Promise<string> {
  const response = await fetch(`${url}/api/auth/signin`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'ines@quillmere.example', password: 'quillmere-demo-2026' }),
  })
  expect(response.status).toBe(200)
  return response.headers.getSetCookie()[0]!.split(';')[0]!
}

const dbAnswers = () => spawnSync('/usr/lib/postgresql/15/bin/pg_isready', ['-h', '127.0.0.1', '-p', String(dbPort), '-q']).status === 0

afterAll(() => rmSync(dataDir, { recursive: true, force: true }))

describe('npm start', () => {
  it('starts with demo data, prints the URL, stops cleanly, and keeps everything for the next start', async () => {
    const first = await start()
    expect(first.output()).toContain(`Portwright is running at ${url}/`)
    expect(first.output()).toContain('Loaded the demo data')
    const home = await fetch(`${url}/signin`)
    expect(await home.text()).toContain('Portwright')
    const health = await (await fetch(`${url}/api/health`)).json()
    expect(health).toEqual({ status: 'ok', database: 'ok' })

    const cookie = await signIn()
    const made = await fetch(`${url}/api/projects`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie },
      body: JSON.stringify({ name: 'Survives a restart' }),
    })
    expect(made.status).toBe(201)
    const secret = readFileSync(join(dataDir, 'session-secret'), 'utf8')
    expect(secret.length).toBeGreaterThanOrEqual(32)

    expect(await stop(first.child)).toBe(0)
    expect(dbAnswers()).toBe(false)

    const second = await start()
    expect(second.output()).not.toContain('Loaded the demo data')
    expect(readFileSync(join(dataDir, 'session-secret'), 'utf8')).toBe(secret)
    // The cookie from before the restart is still valid: same secret, same data.
    const projects = await (await fetch(`${url}/api/projects`, { headers: { cookie } })).json() as { name: string }[]
    expect(projects.map(p => p.name)).toContain('Survives a restart')
    expect(await stop(second.child)).toBe(0)
  }, 240_000)

  it('attack: the published demo password on a server others can reach — refused until the demo accounts are disabled', async () => {
    const env = { ...process.env, HOST: '0.0.0.0', PORT: String(port), PORTWRIGHT_DB_PORT: String(dbPort), PORTWRIGHT_DATA_DIR: dataDir }
    delete env.NUXT_SESSION_PASSWORD
    delete env.NUXT_DATABASE_URL
    const refused = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/start.ts'], { cwd: root, env, encoding: 'utf8', timeout: 120_000 })
    expect(refused.status).toBe(1)
    expect(refused.stderr).toContain('will not listen on 0.0.0.0 while demo accounts still have the published demo password')
    expect(refused.stderr).toContain('npm run demo:disable')
    expect(dbAnswers()).toBe(false)

    const disabled = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/demo-disable.ts'], { cwd: root, env, encoding: 'utf8', timeout: 120_000 })
    expect(disabled.stdout).toContain('Disabled 5 demo accounts')
    const open = await start({ HOST: '0.0.0.0' })
    const attempt = await fetch(`${url}/api/auth/signin`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: 'ines@quillmere.example', password: 'quillmere-demo-2026' }) })
    expect(attempt.status).toBe(401)
    expect(await stop(open.child)).toBe(0)
  }, 240_000)

  it('refuses to start with a session secret shorter than 32 characters', () => {
    const result = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/start.ts'], {
      cwd: root,
      env: { ...process.env, NUXT_SESSION_PASSWORD: 'too-short', PORT: String(port), PORTWRIGHT_DB_PORT: String(dbPort), PORTWRIGHT_DATA_DIR: dataDir },
      encoding: 'utf8',
    })
    expect(result.status).toBe(1)
    expect(result.stderr).toMatch(/NUXT_SESSION_PASSWORD must be at least 32 characters/)
  })
})
