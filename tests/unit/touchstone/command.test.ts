// `npm run -s touchstone -- FILE.sNp` as the network format's command-line section fixes it.
import { spawn } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'

const root = fileURLToPath(new URL('../../../', import.meta.url))
const folder = mkdtempSync(join(tmpdir(), 'portwright-touchstone-'))
const run = (command: string[], cwd = root) => new Promise<{ status: number | null; stdout: string; stderr: string }>((resolve) => {
  const child = spawn('npm', ['run', '-s', ...command], { cwd })
  let stdout = '', stderr = ''
  child.stdout.on('data', (chunk) => { stdout += chunk })
  child.stderr.on('data', (chunk) => { stderr += chunk })
  child.on('close', status => resolve({ status, stdout, stderr }))
})
const example = join(root, 'shared/examples/butler-matrix-4x4.json')

describe('touchstone command', { timeout: 240_000 }, () => {
  it('prints the same JSON as solve --format json for the solver\'s own Touchstone output', async () => {
    const [touchstone, json] = await Promise.all([run(['solve', '--', example, '--points', '21']), run(['solve', '--', example, '--points', '21', '--format', 'json'])])
    expect(touchstone.status).toBe(0)
    const path = join(folder, 'butler.s8p')
    writeFileSync(path, touchstone.stdout)
    const read = await run(['touchstone', '--', path])
    expect(read.stderr).toBe('')
    expect(read.status).toBe(0)
    expect(read.stdout).toBe(json.stdout)
  })

  it('a malformed file: exit 2, FILE:LINE: reason on standard error, nothing on standard output', async () => {
    const path = join(folder, 'broken.s2p')
    writeFileSync(path, '! Quillmere\n# GHZ S RI R 50\n1 0 0 0 0 0 0 0 0\n0.5 0 0 0 0 0 0 0 0\n')
    const result = await run(['touchstone', '--', path])
    expect(result.status).toBe(2)
    expect(result.stdout).toBe('')
    expect(result.stderr).toBe(`${path}:4: the frequency 500 MHz is not above the one before it (1 GHz); frequencies must increase\n`)
  })
})
