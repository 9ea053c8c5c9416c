import { spawn } from 'node:child_process'
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { prepareTuning, resolveTolerances, runTrials } from '../../../shared/tuning/index'

const root = fileURLToPath(new URL('../../../', import.meta.url))
type Run = { status: number | null; stdout: string; stderr: string }
// Spawning tsx is slow on a busy machine; independent cases run side by side.
const run = (command: string, args: string[]) => new Promise<Run>((resolve) => {
  const child = command === 'npm'
    ? spawn('npm', args, { cwd: root })
    : spawn(process.execPath, ['--import', 'tsx', join(root, 'scripts', `${command}.ts`), ...args], { cwd: root })
  let stdout = '', stderr = ''
  child.stdout.on('data', (chunk) => { stdout += chunk })
  child.stderr.on('data', (chunk) => { stderr += chunk })
  child.on('close', status => resolve({ status, stdout, stderr }))
})
const folder = mkdtempSync(join(tmpdir(), 'portwright-tuning-cli-'))
const write = (name: string, value: unknown) => {
  const path = join(folder, name)
  writeFileSync(path, JSON.stringify(value))
  return path
}
const example = (name: string) => join(root, 'shared/examples', `${name}.json`)
const lines = (text: string) => text.trim().split('\n')

describe('tolerance, optimize and beams commands', { timeout: 240_000 }, () => {
  it('tolerance prints trials, passed, yield and seed, the same as the library for that seed', async () => {
    const [first, bad] = await Promise.all([
      run('tolerance', [example('branch-line-tolerances'), '--trials', '150', '--seed', '7']),
      run('tolerance', [example('branch-line-tolerances'), '--trials', '0', '--seed', 'x']),
    ])
    expect(first.status).toBe(0)
    const json = JSON.parse(first.stdout)
    expect(Object.keys(json)).toEqual(['trials', 'passed', 'yield', 'seed'])
    const prepared = prepareTuning(JSON.parse(readFileSync(example('branch-line-tolerances'), 'utf8')))
    if (!prepared.ok) throw new Error('example did not prepare')
    const spreads = resolveTolerances(prepared.setup)
    if (!spreads.ok) throw new Error('tolerances did not resolve')
    const passed = runTrials(prepared.setup, spreads.spreads, { seed: 7, to: 150 }).passed
    expect(json).toEqual({ trials: 150, passed, yield: passed / 150, seed: 7 })
    expect(bad.status).toBe(2)
    expect(bad.stdout).toBe('')
    expect(lines(bad.stderr)).toEqual([
      '--trials: must be a whole number from 1 to 1,000,000 (got "0")',
      '--seed: must be a whole number from 0 to 4,294,967,295 (got "x")',
    ])
  })

  it('tolerance names a document without a spec and a tolerance key that names nothing', async () => {
    const document = JSON.parse(readFileSync(example('branch-line-tolerances'), 'utf8'))
    const noSpec = write('no-spec.json', { ...document, spec: undefined })
    const badKey = write('bad-key.json', { ...document, tolerances: { 'T99.impedance': { relative: 0.1 }, 'T12.impedance': { absolute: '3 pF' } } })
    const [a, b] = await Promise.all([run('tolerance', [noSpec, '--trials', '5', '--seed', '1']), run('tolerance', [badKey, '--trials', '5', '--seed', '1'])])
    expect(a).toMatchObject({ status: 2, stdout: '' })
    expect(a.stderr).toMatch(/^spec: the document has no spec/)
    expect(b).toMatchObject({ status: 2, stdout: '' })
    expect(lines(b.stderr)).toEqual([
      'tolerances.T99.impedance: no block is called "T99"',
      expect.stringMatching(/^tolerances\.T12\.impedance\.absolute: "3 pF" is a capacitance, but an impedance/),
    ])
  })

  it('optimize prints the tuned document and ends standard error with {"met", "evaluations"}', async () => {
    const [tuned, bad] = await Promise.all([
      run('optimize', [example('branch-line-detuned'), '--seed', '3', '--max-evaluations', '1500']),
      run('optimize', [example('branch-line-detuned'), '--max-evaluations', '0']),
    ])
    expect(tuned.status).toBe(0)
    const last = JSON.parse(lines(tuned.stderr).at(-1)!)
    expect(Object.keys(last)).toEqual(['met', 'evaluations'])
    expect(last.met).toBe(true)
    expect(last.evaluations).toBeLessThanOrEqual(1500)
    const document = JSON.parse(tuned.stdout)
    const prepared = prepareTuning(document)
    expect(prepared.ok).toBe(true)
    // Only the tunables changed; layout and everything else are as read.
    const original = JSON.parse(readFileSync(example('branch-line-detuned'), 'utf8'))
    expect(document.blocks.map((b: { layout: unknown }) => b.layout)).toEqual(original.blocks.map((b: { layout: unknown }) => b.layout))
    expect(typeof document.blocks.find((b: { id: string }) => b.id === 'T12').params.impedance).toBe('number')
    expect(document.spec).toEqual(original.spec)
    expect(bad).toMatchObject({ status: 2, stdout: '' })
    expect(lines(bad.stderr)).toEqual(['--max-evaluations: must be a whole number from 1 to 1,000,000 (got "0")'])
  })

  it('beams (through npm run, as documented) prints each input\'s beam and the crossover', async () => {
    const [good, badOptions, badPorts] = await Promise.all([
      run('npm', ['run', '-s', 'beams', '--', example('butler-matrix-4x4'), '--inputs', '1,2,3,4', '--outputs', '5,6,7,8', '--spacing', '0.5', '--frequency', '2.45 GHz']),
      run('beams', [example('butler-matrix-4x4'), '--inputs', '1,x', '--outputs', '5,6,5', '--spacing', '0']),
      run('beams', [example('butler-matrix-4x4'), '--inputs', '1', '--outputs', '5,6,9', '--spacing', '0.5']),
    ])
    expect(good.status).toBe(0)
    const json = JSON.parse(good.stdout)
    expect(Object.keys(json)).toEqual(['frequency', 'beams', 'crossoverDb'])
    expect(json.frequency).toBe(2.45e9)
    expect(json.beams.map((b: object) => Object.keys(b))).toEqual(Array(4).fill(['input', 'peakDeg', 'peakDb', 'halfPowerWidthDeg', 'sidelobeDb']))
    // sin θ = −β/(2π d) with β = −45°, +135°, −135°, +45° at d = λ/2 (Balanis, Antenna Theory, 3rd ed., §6.3 [memory]).
    expect(json.beams.map((b: { peakDeg: number }) => b.peakDeg)).toEqual([14.477512, -48.590378, 48.590378, -14.477512])
    // Derived by hand: orthogonal beams of 4 elements cross at 20·log10(1/(4 sin(π/8))) = −3.698 dB.
    expect(json.crossoverDb).toBeCloseTo(20 * Math.log10(1 / (4 * Math.sin(Math.PI / 8))), 5)
    expect(badOptions).toMatchObject({ status: 2, stdout: '' })
    expect(lines(badOptions.stderr)).toEqual([
      '--inputs: "x" is not a port number (give ports separated by commas, e.g. 1,2,3,4)',
      '--outputs: port 5 is given twice',
      '--spacing: must be a number above 0 and at most 100 (got "0")',
    ])
    expect(badPorts).toMatchObject({ status: 2, stdout: '' })
    expect(lines(badPorts.stderr)).toEqual([
      '--outputs: port 9 does not exist (the network has 8 ports)',
      '--frequency: is required, because the document has no spec centre to use',
    ])
  })
})
