import { spawn, spawnSync } from 'node:child_process'
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { branchLineHybrid } from '../../../shared/examples/index'
import { solveDocument } from '../../../shared/solver/index'
import { readTouchstone } from './touchstone'

const root = fileURLToPath(new URL('../../../', import.meta.url))
const run = (script: 'solve' | 'bench', args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', join(root, 'scripts', `${script}.ts`), ...args], { cwd: root, encoding: 'utf8' })
// Spawning tsx is slow on a busy machine; independent cases run side by side.
const runAsync = (script: 'solve' | 'bench', args: string[]) => new Promise<{ status: number | null; stdout: string; stderr: string }>((resolve) => {
  const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'scripts', `${script}.ts`), ...args], { cwd: root })
  let stdout = '', stderr = ''
  child.stdout.on('data', (chunk) => { stdout += chunk })
  child.stderr.on('data', (chunk) => { stderr += chunk })
  child.on('close', status => resolve({ status, stdout, stderr }))
})
const folder = mkdtempSync(join(tmpdir(), 'portwright-cli-'))
const write = (name: string, value: unknown) => {
  const path = join(folder, name)
  writeFileSync(path, typeof value === 'string' ? value : JSON.stringify(value))
  return path
}
const example = join(root, 'shared/examples/branch-line-hybrid.json')
const P = (i: number, impedance?: number) => ({ id: `P${i}`, type: 'port', params: impedance ? { index: i, impedance } : { index: i } })

describe('solve command', { timeout: 240_000 }, () => {
  it('prints Touchstone that reads back to the solver\'s numbers (through npm run, as documented)', () => {
    const result = spawnSync('npm', ['run', '-s', 'solve', '--', example], { cwd: root, encoding: 'utf8' })
    expect(result.status).toBe(0)
    expect(result.stderr).toBe('')
    const parsed = readTouchstone(result.stdout, 4)
    expect(result.stdout).toMatch(/^! Portwright solve: Branch-line quadrature hybrid, 2\.45 GHz\n! 4 ports, 251 frequencies\n! Simulated results: verify hardware by measurement\. High RF power can injure[^\n]*\n# HZ S RI R 50\n/)
    const solved = solveDocument(branchLineHybrid)
    expect(solved.ok).toBe(true)
    if (!solved.ok) return
    expect(parsed.frequencies).toEqual(Array.from(solved.result.frequencies))
    parsed.s.forEach((m, k) => m.forEach((row, i) => row.forEach(([re, im], j) => {
      expect(re).toBe(solved.result.re[(k * 4 + i) * 4 + j])
      expect(im).toBe(solved.result.im[(k * 4 + i) * 4 + j])
    })))
  })

  it('--format json with sweep overrides', () => {
    const result = run('solve', [example, '--format', 'json', '--start', '2 GHz', '--stop', '3e9', '--points', '3', '--spacing', 'log'])
    expect(result.status).toBe(0)
    const json = JSON.parse(result.stdout)
    expect(json.ports).toBe(4)
    expect(json.impedances).toEqual([50, 50, 50, 50])
    expect(json.frequencies[0]).toBe(2e9)
    expect(json.frequencies[1]).toBeCloseTo(Math.sqrt(6) * 1e9, 0)
    expect(json.frequencies[2]).toBe(3e9)
    const solved = solveDocument(branchLineHybrid, { sweep: { start: 2e9, stop: 3e9, points: 3, spacing: 'log' } })
    if (!solved.ok) throw new Error('example did not solve')
    expect(json.s[1][2][0]).toEqual([solved.result.re[16 + 8], solved.result.im[16 + 8]])
  })

  it('a sweep through a trapped resonance prints the whole result and one warning on standard error', () => {
    // The from-lines branch-line at exactly 2·f0 = 4.9 GHz (common practice: a 2λ ring with nulls at the ports).
    const result = run('solve', [example, '--format', 'json', '--start', '4.8 GHz', '--stop', '5 GHz', '--points', '3'])
    expect(result.status).toBe(0)
    expect(JSON.parse(result.stdout).frequencies).toEqual([4.8e9, 4.9e9, 5e9])
    expect(result.stderr.trim().split('\n')).toHaveLength(1)
    expect(result.stderr).toMatch(/^warning: .*4\.9 GHz/)
  })

  it('ports of different impedance give Touchstone 2.0 with [Reference]', () => {
    const path = write('unequal.json', {
      format: 'portwright.network', version: 1, sweep: { start: '1 GHz', stop: '2 GHz', points: 2 },
      blocks: [P(1), P(2, 75), { id: 'L', type: 'line', params: { impedance: 61.2, degrees: 90, at: '1.5 GHz' } }],
      wires: [['P1.1', 'L.1'], ['L.2', 'P2.1']],
    })
    const result = run('solve', [path])
    expect(result.status).toBe(0)
    expect(result.stdout).toMatch(/\[Version\] 2\.0/)
    expect(result.stdout).toMatch(/\[Reference\] 50 75/)
    expect(readTouchstone(result.stdout, 2).frequencies).toEqual([1e9, 2e9])
  })

  it('a bad document exits 2 with one line per problem and nothing on standard output', () => {
    const path = write('bad.json', {
      format: 'portwright.network', version: 1, sweep: { start: '1 GHz', stop: '2 GHz', points: 2 },
      blocks: [P(1), P(3), { id: 'TA', type: 'line', params: { impedance: '2.45 GHz', degrees: 90, at: '1 GHz' } }],
      wires: [['P1.1', 'TA.1'], ['TA.2', 'P3.1'], ['TA.2', 'NOPE.1']],
    })
    const result = run('solve', [path])
    expect(result.status).toBe(2)
    expect(result.stdout).toBe('')
    expect(result.stderr.trim().split('\n')).toEqual([
      'block TA (line), impedance: "2.45 GHz" is a frequency, but an impedance (Ω) is expected',
      'wire 3 (TA.2 – NOPE.1): there is no block NOPE',
      'port indices must run from 1 to 3 without gaps: 2 is missing',
    ])
  })

  it('unreadable files, bad JSON, bad options and singular networks also exit 2 without output', async () => {
    const singular = write('singular.json', {
      format: 'portwright.network', version: 1, sweep: { start: '2.45 GHz', stop: '2.45 GHz', points: 1 },
      // A 360° ideal link shorted onto itself beside an open end is singular at every frequency.
      blocks: [P(1), { id: 'T', type: 'line', params: { impedance: 50, degrees: 30, at: '2.45 GHz' } }, { id: 'LOOP', type: 'phase', params: { degrees: 360 } }, { id: 'OPEN', type: 'load', params: { end: 'open' } }],
      wires: [['P1.1', 'T.1'], ['T.2', 'OPEN.1'], ['OPEN.1', 'LOOP.1'], ['LOOP.1', 'LOOP.2']],
    })
    const cases = [[join(folder, 'missing.json')], [write('broken.json', '{ nope')], [example, '--points', 'many'], [example, '--format', 'xml'], [example, '--start', '3 ohm'], [singular]]
    const results = await Promise.all(cases.map(args => runAsync('solve', args)))
    results.forEach((result, c) => {
      expect(result.status, cases[c]!.join(' ')).toBe(2)
      expect(result.stdout).toBe('')
      expect(result.stderr.trim().split('\n')).toHaveLength(1)
    })
    expect(results[0]!.stderr).toMatch(/missing\.json: cannot be read \(ENOENT\)/)
    expect(results[1]!.stderr).toMatch(/broken\.json: not valid JSON/)
    expect(results[2]!.stderr).toMatch(/^--points: must be a whole number/)
    expect(results[4]!.stderr).toMatch(/^--start: "3 ohm" is an impedance, but a frequency \(Hz\) is expected/)
    expect(results[5]!.stderr).toMatch(/cannot be solved at 2\.45 GHz/)
  })

  it('ends quietly with status 0, nothing on standard error, when its reader stops early (… | head)', async () => {
    const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'scripts', 'solve.ts'), join(root, 'shared/examples/butler-matrix-4x4.json'), '--points', '10001'], { cwd: root })
    let stderr = ''
    child.stderr.on('data', (chunk) => { stderr += chunk })
    // Read the first chunk only, then close our end of the pipe while the command is still writing.
    const first = await new Promise<string>(resolve => child.stdout.once('data', chunk => resolve(String(chunk))))
    child.stdout.destroy()
    const status = await new Promise<number | null>(resolve => child.on('close', code => resolve(code)))
    expect(first).toMatch(/^! Portwright solve/)
    expect(stderr).toBe('')
    expect(status).toBe(0)
  })

  it('resolves subnetworks relative to the document that names them', () => {
    mkdirSync(join(folder, 'parts'), { recursive: true })
    write('parts/inner.json', {
      format: 'portwright.network', version: 1,
      blocks: [P(1), P(2), { id: 'L', type: 'line', params: { impedance: 50, degrees: 90, at: '1 GHz' } }],
      wires: [['P1.1', 'L.1'], ['L.2', 'P2.1']],
    })
    write('parts/section.json', {
      format: 'portwright.network', version: 1,
      blocks: [P(1), P(2), { id: 'I', type: 'subnetwork', params: { network: 'inner.json' } }],
      wires: [['P1.1', 'I.1'], ['I.2', 'P2.1']],
    })
    const top = write('top.json', {
      format: 'portwright.network', version: 1, sweep: { start: '1 GHz', stop: '1 GHz', points: 1 },
      blocks: [P(1), P(2), { id: 'S', type: 'subnetwork', params: { network: 'parts/section.json' } }],
      wires: [['P1.1', 'S.1'], ['S.2', 'P2.1']],
    })
    const result = run('solve', [top, '--format', 'json'])
    expect(result.stderr).toBe('')
    const json = JSON.parse(result.stdout)
    // A 90° matched line: S21 = −j (Pozar, 4th ed., §2.1).
    expect(json.s[0][1][0][0]).toBeCloseTo(0, 12)
    expect(json.s[0][1][0][1]).toBeCloseTo(-1, 12)
  })
})

describe('bench command', { timeout: 240_000 }, () => {
  it('prints one JSON line with points, blocks, median and minimum time', () => {
    const result = run('bench', [join(root, 'shared/examples/butler-matrix-4x4.json'), '--points', '101', '--repeat', '3'])
    expect(result.status).toBe(0)
    const lines = result.stdout.trim().split('\n')
    expect(lines).toHaveLength(1)
    const json = JSON.parse(lines[0]!)
    expect(Object.keys(json)).toEqual(['points', 'blocks', 'medianMs', 'minMs'])
    expect(json.points).toBe(101)
    expect(json.blocks).toBe(20)
    expect(json.minMs).toBeGreaterThan(0)
    expect(json.medianMs).toBeGreaterThanOrEqual(json.minMs)
  })

  it('fails like solve on a bad document', () => {
    const result = run('bench', [write('bad-bench.json', { format: 'portwright.network', version: 1, blocks: [], wires: [] })])
    expect(result.status).toBe(2)
    expect(result.stdout).toBe('')
    expect(result.stderr.trim()).toBe('the network has no ports: add at least one port block')
  })
})
