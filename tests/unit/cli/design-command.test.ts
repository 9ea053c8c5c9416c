import { spawn } from 'node:child_process'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { DESIGN_KINDS, runDesign } from '../../../shared/design/index'
import { parseNetworkDocument } from '../../../shared/network/index'

const root = fileURLToPath(new URL('../../../', import.meta.url))
// Spawning tsx is slow on a busy machine; independent cases run side by side.
const design = (args: string[]) => new Promise<{ status: number | null; stdout: string; stderr: string }>((resolve) => {
  const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'scripts', 'design.ts'), ...args], { cwd: root })
  let stdout = '', stderr = ''
  child.stdout.on('data', (chunk) => { stdout += chunk })
  child.stderr.on('data', (chunk) => { stderr += chunk })
  child.on('close', status => resolve({ status, stdout, stderr }))
})

describe('design command', { timeout: 240_000 }, () => {
  it('prints a valid version-1.1 document for every KIND, values with units or in SI', async () => {
    const runs = await Promise.all([
      design(['quadrature', '--frequency', '2.45 GHz', '--impedance', '50 ohm', '--sections', '2']),
      design(['ring', '--frequency', '2.45e9', '--impedance', '50']),
      design(['divider', '--frequency', '900 MHz', '--impedance', '50', '--ratio-db', '3']),
      design(['transformer', '--frequency', '1 GHz', '--impedance', '50', '--load', '100', '--sections', '3', '--response', 'chebyshev', '--max-reflection', '0.05']),
      design(['coupled-line', '--frequency', '3 GHz', '--impedance', '50', '--coupling-db', '20']),
    ])
    for (const run of runs) {
      expect(run.stderr).toBe('')
      expect(run.status).toBe(0)
      const document = JSON.parse(run.stdout)
      expect(document.version).toBe(1.1)
      expect(parseNetworkDocument(document).ok).toBe(true)
      expect(document.spec.center).toBe('f0')
      expect(document.sweep).toBeDefined()
    }
    expect(JSON.parse(runs[0]!.stdout).variables).toEqual({ f0: '2.45 GHz', Z0: '50 ohm' })
    expect(JSON.parse(runs[4]!.stdout).blocks.map((b: { type: string }) => b.type)).toContain('coupled')
  })

  it('places the design in microstrip with the substrate options of our own', async () => {
    const run = await design(['quadrature', '--frequency', '2.45 GHz', '--impedance', '50', '--substrate-permittivity', '3.5', '--substrate-height', '0.508 mm', '--substrate-thickness', '35 um'])
    expect(run.stderr).toBe('')
    expect(run.status).toBe(0)
    const document = JSON.parse(run.stdout)
    expect(parseNetworkDocument(document).ok).toBe(true)
    expect(document.substrates).toEqual({ board: { permittivity: 3.5, height: '0.508 mm', thickness: '35 um' } })
    expect(document.blocks.filter((b: { type: string }) => b.type === 'microstrip')).toHaveLength(4)
    const half = await design(['ring', '--frequency', '2.45 GHz', '--impedance', '50', '--substrate-height', '1 mm'])
    expect(half.status).toBe(2)
    expect(half.stdout).toBe('')
    expect(half.stderr).toContain('--substrate-permittivity: is required for a design in microstrip')
  })

  it('bad input: exit 2, one line per problem naming the option, nothing on standard output', async () => {
    const [bad, unknown, missing] = await Promise.all([
      design(['transformer', '--frequency', '1 GHz', '--impedance', '50 m', '--load', '100', '--sections', '2.5', '--response', 'flat']),
      design(['spiral', '--frequency', '1 GHz']),
      design(['coupled-line', '--frequency', '1 GHz', '--impedance', '50', '--colour', 'red']),
    ])
    expect(bad.status).toBe(2)
    expect(bad.stdout).toBe('')
    const lines = bad.stderr.trim().split('\n')
    expect(lines).toHaveLength(3)
    expect(lines[0]).toMatch(/^--impedance: /)
    expect(lines[1]).toMatch(/^--sections: must be a whole number/)
    expect(lines[2]).toBe('--response: must be binomial or chebyshev (got "flat")')
    expect(unknown.status).toBe(2)
    expect(unknown.stderr).toMatch(/^spiral: not a design kind/)
    expect(missing.status).toBe(2)
    expect(missing.stderr).toMatch(/--colour: is not an option of coupled-line/)
    expect(missing.stderr).toMatch(/--coupling-db: is required/)
  })

  it('every KIND has at least its required options; a Chebyshev ripple above the load\'s own mismatch is refused', () => {
    expect(DESIGN_KINDS).toEqual(['quadrature', 'ring', 'divider', 'transformer', 'coupled-line'])
    const refused = runDesign('transformer', { 'frequency': '1 GHz', 'impedance': '50', 'load': '55', 'sections': '2', 'response': 'chebyshev', 'max-reflection': '0.1' })
    expect(refused.ok).toBe(false)
    if (!refused.ok) expect(refused.problems.map(p => p.option)).toEqual(['max-reflection'])
    const weak = runDesign('quadrature', { 'frequency': '1 GHz', 'impedance': '50', 'coupling-db': '15', 'sections': '2' })
    expect(weak.ok).toBe(false)
    if (!weak.ok) expect(weak.problems[0]!.message).toMatch(/at most 10 dB with 2 sections/)
    expect(runDesign('quadrature', { 'frequency': '1 GHz', 'impedance': '50', 'coupling-db': '15' }).ok).toBe(true)
    const equal = runDesign('transformer', { frequency: '1 GHz', impedance: '50', load: '50', sections: '2', response: 'binomial' })
    expect(equal.ok).toBe(false)
  })
})
