import { spawnSync } from 'node:child_process'
import { existsSync, statSync, readdirSync } from 'node:fs'
import { join } from 'node:path'

const SOURCES = ['app', 'server', 'shared', 'public', 'nuxt.config.ts', 'tailwind.config.ts', 'package-lock.json']

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0
  const stat = statSync(path)
  if (!stat.isDirectory()) return stat.mtimeMs
  let newest = stat.mtimeMs
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, entry)))
  return newest
}

/** The built server's folder; PORTWRIGHT_BUILD_NAME selects a separate one (see nuxt.config.ts). */
export function outputDir(root: string): string {
  const name = process.env.PORTWRIGHT_BUILD_NAME
  return join(root, name ? `.output-${name}` : '.output')
}

/** Builds the app when its output is missing or older than any source file. */
export function buildIfStale(root: string, force = false): void {
  const entry = join(outputDir(root), 'server', 'index.mjs')
  const built = existsSync(entry) ? statSync(entry).mtimeMs : 0
  const stale = force || SOURCES.some(s => newestMtime(join(root, s)) > built)
  if (!stale) return
  console.log('Building the app (nuxt build)…')
  const result = spawnSync('npx', ['nuxt', 'build'], { cwd: root, stdio: ['ignore', 'pipe', 'inherit'], encoding: 'utf8' })
  if (result.status !== 0) {
    process.stdout.write(result.stdout ?? '')
    throw new Error('nuxt build failed')
  }
}
