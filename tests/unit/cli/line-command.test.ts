import { spawn } from 'node:child_process'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { analyseMicrostrip } from '../../../shared/microstrip/analyse-microstrip'
import { DB_PER_NEPER } from '../../../shared/microstrip/constants'

const root = fileURLToPath(new URL('../../../', import.meta.url))
const run = (args: string[], viaNpm = false) => new Promise<{ status: number | null; stdout: string; stderr: string }>((resolve) => {
  const child = viaNpm
    ? spawn('npm', ['run', '-s', 'line', '--', ...args], { cwd: root })
    : spawn(process.execPath, ['--import', 'tsx', join(root, 'scripts', 'line.ts'), ...args], { cwd: root })
  let stdout = '', stderr = ''
  child.stdout.on('data', (chunk) => { stdout += chunk })
  child.stderr.on('data', (chunk) => { stderr += chunk })
  child.on('close', status => resolve({ status, stdout, stderr }))
})

describe('line command', { timeout: 240_000 }, () => {
  it('synthesises Pozar Example 3.7 through npm run, as documented', async () => {
    // Pozar, Microwave Engineering, 4th ed., Example 3.7 [memory]: εr = 2.20, d = 0.127 cm, 50 Ω, 90° at 2.5 GHz
    // → W = 0.391 cm, l = 2.19 cm (Pozar's simpler closed forms; ours differ by well under 1 %).
    const result = await run(['--permittivity', '2.2', '--height', '0.127 cm', '--impedance', '50', '--frequency', '2.5 GHz', '--degrees', '90'], true)
    expect(result.stderr).toBe('')
    expect(result.status).toBe(0)
    const output = JSON.parse(result.stdout)
    expect(Object.keys(output)).toEqual(['width', 'impedance', 'epsEff', 'wavelength', 'length', 'lossDbPerMetre'])
    expect(Math.abs(output.width / 0.00391 - 1)).toBeLessThan(0.005)
    expect(Math.abs(output.length / 0.0219 - 1)).toBeLessThan(0.01)
    expect(output.impedance).toBeCloseTo(50, 6)
    expect(output.length).toBeCloseTo(output.wavelength / 4, 12)
    expect(output.lossDbPerMetre).toBe(0)
  })

  it('analyses a width, with loss at a frequency, and prints only the keys it has', async () => {
    const [plain, lossy] = await Promise.all([
      run(['--permittivity', '3.5', '--height', '0.5 mm', '--width', '1.1 mm']),
      run(['--permittivity', '3.5', '--height', '0.5 mm', '--width', '1.1 mm', '--thickness', '35 um', '--frequency', '5 GHz', '--loss-tangent', '0.003', '--conductivity', '5.8e7']),
    ])
    expect(plain.status).toBe(0)
    expect(Object.keys(JSON.parse(plain.stdout))).toEqual(['width', 'impedance', 'epsEff'])
    const substrate = { permittivity: 3.5, height: 0.5e-3, thickness: 35e-6, lossTangent: 0.003, conductivity: 5.8e7, roughness: 0 }
    const line = analyseMicrostrip(substrate, 1.1e-3, 5e9)
    const output = JSON.parse(lossy.stdout)
    expect(Object.keys(output)).toEqual(['width', 'impedance', 'epsEff', 'wavelength', 'lossDbPerMetre'])
    expect(output.impedance).toBe(line.impedance)
    expect(output.lossDbPerMetre).toBeCloseTo(DB_PER_NEPER * (line.conductorLoss + line.dielectricLoss), 12)
  })

  it('answers bad input with exit 2 and one line per problem naming the option', async () => {
    const [bad, missing, unknown, impossible] = await Promise.all([
      run(['--permittivity', 'x', '--height', '-1', '--width', '1 mm', '--impedance', '50', '--degrees', '90']),
      run([]),
      run(['--permittivity', '4', '--height', '1 mm', '--width', '1 mm', '--colour', 'red']),
      run(['--permittivity', '4', '--height', '1 mm', '--impedance', '900 ohm']),
    ])
    expect(bad.status).toBe(2)
    expect(bad.stdout).toBe('')
    expect(bad.stderr.trim().split('\n')).toEqual([
      '--permittivity: "x" uses the unknown name x',
      '--height: must be greater than zero (got -1)',
      '--width: give either --width (analysis) or --impedance (synthesis), not both',
      '--degrees: needs --frequency, the frequency at which the line has that electrical length',
    ])
    expect(missing.status).toBe(2)
    expect(missing.stderr.trim().split('\n').map(line => line.split(':')[0])).toEqual(['--permittivity', '--height', '--width'])
    expect(unknown.status).toBe(2)
    expect(unknown.stderr.trim().split('\n')).toHaveLength(1)
    expect(unknown.stderr).toMatch(/--colour/)
    expect(impossible.status).toBe(2)
    expect(impossible.stderr).toMatch(/^--impedance: no strip width .* gives 900 Ω/)
  })

  it('prints a result with warnings on standard error when a model is used outside its range', async () => {
    const result = await run(['--permittivity', '9.8', '--height', '0.635 mm', '--width', '1 um'])
    expect(result.status).toBe(0)
    expect(JSON.parse(result.stdout).width).toBeCloseTo(1e-6, 15)
    expect(result.stderr).toMatch(/^warning: W\/h = 0\.00157 is outside 0\.01…100, the range of the Hammerstad–Jensen static model\n/)
  })
})
