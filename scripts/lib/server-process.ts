import { spawn, type ChildProcess } from 'node:child_process'
import { join } from 'node:path'
import { outputDir } from './build'

/**
 * Starts the built server and resolves once /api/health answers ok. `onStderr`
 * sees each line the server writes to stderr (still passed on to ours);
 * `nodeArgs` go before the entry (e.g. --cpu-prof).
 */
export async function startServer(
  root: string, env: Record<string, string>, port: number, host = '127.0.0.1',
  options: { onStderr?: (line: string) => void, nodeArgs?: string[] } = {},
): Promise<ChildProcess> {
  const child = spawn(process.execPath, [...(options.nodeArgs ?? []), join(outputDir(root), 'server', 'index.mjs')], {
    cwd: root,
    env: { ...process.env, ...env, PORT: String(port), HOST: host, NITRO_PORT: String(port), NITRO_HOST: host },
    stdio: ['ignore', 'inherit', options.onStderr ? 'pipe' : 'inherit'],
  })
  if (options.onStderr && child.stderr) {
    let pending = ''
    child.stderr.on('data', (chunk: Buffer) => {
      process.stderr.write(chunk)
      const lines = (pending + chunk.toString('utf8')).split('\n')
      pending = lines.pop() ?? ''
      for (const line of lines) options.onStderr!(line)
    })
  }
  const url = `http://${host}:${port}/api/health`
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error(`The server exited during start-up (code ${child.exitCode}).`)
    try {
      const response = await fetch(url)
      if (response.ok) return child
    } catch { /* not listening yet */ }
    await new Promise(r => setTimeout(r, 100))
  }
  child.kill('SIGTERM')
  throw new Error(`The server did not answer ${url} within 30 s.`)
}

/** Stops a child process, escalating to SIGKILL after a grace period. */
export async function stopProcess(child: ChildProcess, graceMs = 5000): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return
  const exited = new Promise<void>(resolve => child.once('exit', () => resolve()))
  child.kill('SIGTERM')
  const timer = setTimeout(() => child.kill('SIGKILL'), graceMs)
  await exited
  clearTimeout(timer)
}
