import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { API_SOLVE_LIMITS, solveForApi } from '../../../shared/automation/api-solve'
import { effectiveTokenRole } from '../../../shared/automation/effective-role'
import { solveDocument } from '../../../shared/solver/index'
import { solveResultJson, solveResultJsonText } from '../../../shared/solver/solve-json'

const examples = join(import.meta.dirname, '..', '..', '..', 'shared', 'examples')
const read = (name: string) => JSON.parse(readFileSync(join(examples, name), 'utf8')) as Record<string, unknown>

describe('solve JSON text', () => {
  it('is exactly JSON.stringify of the contract object, for every example', () => {
    for (const name of ['branch-line-hybrid.json', 'ring-hybrid.json', 'wilkinson-divider.json']) {
      const solved = solveDocument(read(name), { sweep: { points: 7 } })
      if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('; '))
      expect(solveResultJsonText(solved.result), name).toBe(JSON.stringify(solveResultJson(solved.result)))
    }
  })
})

describe('solveForApi', () => {
  it('applies a sweep override given with units', () => {
    const outcome = solveForApi({ document: read('branch-line-hybrid.json'), networks: [], sweep: { start: '2 GHz', stop: '3 GHz', points: 3 } })
    if (!outcome.ok) throw new Error(outcome.problems.join('; '))
    expect(JSON.parse(outcome.json).frequencies).toEqual([2e9, 2.5e9, 3e9])
  })

  it('names the sweep field that cannot be read', () => {
    const outcome = solveForApi({ document: read('branch-line-hybrid.json'), networks: [], sweep: { start: '2 ohm' } })
    expect(outcome.ok).toBe(false)
    if (!outcome.ok) expect(outcome.problems[0]).toMatch(/^sweep\.start: /)
  })

  it('refuses an answer over the value limit before solving, and says how many points would do', () => {
    const outcome = solveForApi({ document: read('branch-line-hybrid.json'), networks: [], sweep: { points: 20_001 } })
    expect(outcome.ok).toBe(true)
    const tooMany = solveForApi({ document: read('butler-matrix-4x4.json'), networks: [], sweep: { points: 20_001 } })
    // 8 ports: 64 × 20,001 = 1,280,064 values; 500,000 / 64 = 7,812 points (derived by hand).
    expect(API_SOLVE_LIMITS.values).toBe(500_000)
    expect(tooMany.ok).toBe(false)
    if (!tooMany.ok) expect(tooMany.problems[0]).toMatch(/1,280,064 .* 7,812 points or fewer/)
  })

  it('resolves subnetworks only from the networks it is given', () => {
    const outer = { format: 'portwright.network', version: 1, name: 'Outer', referenceImpedance: 50, sweep: { start: 1e9, stop: 1e9, points: 1 },
      blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } }, { id: 'S', type: 'subnetwork', params: { network: 'Line' } }],
      wires: [['P1.1', 'S.1'], ['S.2', 'P2.1']] }
    const line = { format: 'portwright.network', version: 1, name: 'Line', referenceImpedance: 50,
      blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } }, { id: 'L', type: 'line', params: { impedance: 50, degrees: 90, at: 1e9 } }],
      wires: [['P1.1', 'L.1'], ['L.2', 'P2.1']] }
    expect(solveForApi({ document: outer, networks: [] }).ok).toBe(false)
    const solved = solveForApi({ document: outer, networks: [['Line', line]] })
    if (!solved.ok) throw new Error(solved.problems.join('; '))
    // A matched 90° line: S21 = e^{−jπ/2} = −j (common practice).
    const [re, im] = JSON.parse(solved.json).s[0][1][0]
    expect(re).toBeCloseTo(0, 12)
    expect(im).toBeCloseTo(-1, 12)
  })
})

describe('effectiveTokenRole', () => {
  it('is the lower of the ceiling and the membership role', () => {
    expect(effectiveTokenRole('editor', 'owner')).toBe('editor')
    expect(effectiveTokenRole('editor', 'viewer')).toBe('viewer')
    expect(effectiveTokenRole('viewer', 'owner')).toBe('viewer')
    expect(effectiveTokenRole('reviewer', 'editor')).toBe('reviewer')
    expect(effectiveTokenRole('reviewer', 'reviewer')).toBe('reviewer')
  })
})
