// Document limits (shared/network/limits.ts): each is an attack on the server's time or memory by one
// person's document, refused with a message that names the limit.
import { describe, expect, it } from 'vitest'
import { DOCUMENT_LIMITS } from '../../../shared/network/limits'
import { parseNetworkDocument } from '../../../shared/network/schema'
import { prepareNetwork } from '../../../shared/solver/index'
import { seededRandom, pick } from '../../support/seeded-random'

const base = () => ({ format: 'portwright.network', version: 1, name: 'Limits', referenceImpedance: 50, blocks: [] as unknown[], wires: [] as unknown[] })
const firstProblem = (input: unknown) => {
  const parsed = parseNetworkDocument(input)
  expect(parsed.ok).toBe(false)
  return parsed.ok ? '' : parsed.problems[0]!.message
}
const line = (id: string) => ({ id, type: 'line', params: { impedance: 50, degrees: 90, at: 1e9 } })

describe('document limits', () => {
  it('attack: a document of a million blocks, wires or variables', () => {
    expect(firstProblem({ ...base(), blocks: Array.from({ length: DOCUMENT_LIMITS.blocks + 1 }, (_, i) => line(`L${i}`)) })).toMatch(/at most 2,000 blocks/)
    expect(firstProblem({ ...base(), wires: Array.from({ length: DOCUMENT_LIMITS.wires + 1 }, () => ['A.1', 'B.1']) })).toMatch(/at most 4,000 wires/)
    const variables = Object.fromEntries(Array.from({ length: DOCUMENT_LIMITS.variables + 1 }, (_, i) => [`v${i}`, i]))
    expect(firstProblem({ ...base(), variables })).toMatch(/at most 200 variables/)
  })

  it('attack: ids and names thousands of characters long break every screen they appear on', () => {
    expect(firstProblem({ ...base(), blocks: [line('L'.repeat(2000))] })).toMatch(/block id may have at most 40 characters/)
    expect(firstProblem({ ...base(), name: 'n'.repeat(5000) })).toMatch(/network name may have at most 200 characters/)
    expect(firstProblem({ ...base(), variables: { ['x'.repeat(41)]: 1 } })).toMatch(/variable name may have at most 40 characters/)
    expect(firstProblem({ ...base(), wires: [['A'.repeat(60) + '.1', 'B.1']] })).toMatch(/terminal may have at most 48 characters/)
  })

  it('attack: a sweep of ten million points solved on the server', () => {
    expect(firstProblem({ ...base(), sweep: { start: 1e9, stop: 2e9, points: 10_000_000 } })).toMatch(/at most 20,001 points/)
    expect(parseNetworkDocument({ ...base(), sweep: { start: 1e9, stop: 2e9, points: 20_001 } }).ok).toBe(true)
  })

  it('attack: networks that each use the next one four times multiply the work', () => {
    // Network n uses network n+1 four times in cascade; expanded, the top holds 4^depth copies of the bottom.
    const level = (next: string | null) => ({
      ...base(),
      blocks: [
        { id: 'P1', type: 'port', params: { index: 1 } }, { id: 'P2', type: 'port', params: { index: 2 } },
        ...(next ? ['A', 'B', 'C', 'D'].map(id => ({ id, type: 'subnetwork', params: { network: next } })) : [line('A'), line('B'), line('C'), line('D')]),
      ],
      wires: [['P1.1', 'A.1'], ['A.2', 'B.1'], ['B.2', 'C.1'], ['C.2', 'D.1'], ['D.2', 'P2.1']],
    })
    const networks = new Map(Array.from({ length: 8 }, (_, i) => [`n${i}`, level(i < 7 ? `n${i + 1}` : null)]))
    const result = prepareNetwork(networks.get('n0'), { resolveSubnetwork: ref => networks.get(ref) })
    expect(result.ok).toBe(false)
    if (!result.ok) expect(result.problems.map(p => p.message).join(' ')).toMatch(/more than 20,000 blocks \(reached inside "n1" → /)
    // Two levels of the same chain stay well inside the budget and solve.
    const shallow = new Map([['a', level('b')], ['b', level(null)]])
    expect(prepareNetwork(shallow.get('a'), { resolveSubnetwork: ref => shallow.get(ref) }).ok).toBe(true)
  })

  it('fuzz: 10,000 random and mutated documents never make the validator throw, and what it accepts is within the limits', () => {
    const random = seededRandom(20261202)
    const atoms: unknown[] = [null, true, 0, -1, 1e308, NaN, '', 'x', '50 ohm', 'A.1', [], {}, 'L'.repeat(45), Array(3).fill('A.1')]
    const mutate = (value: unknown, depth: number): unknown => {
      if (depth > 4 || random() < 0.3) return pick(random, atoms)
      if (Array.isArray(value)) {
        const copy = value.map(v => (random() < 0.2 ? mutate(v, depth + 1) : v))
        if (random() < 0.2) copy.push(mutate(pick(random, atoms), depth + 1))
        return copy
      }
      if (value && typeof value === 'object') {
        const copy: Record<string, unknown> = { ...(value as Record<string, unknown>) }
        const keys = Object.keys(copy)
        if (keys.length && random() < 0.5) {
          const key = pick(random, keys)
          copy[key] = mutate(copy[key], depth + 1)
        }
        if (random() < 0.1) delete copy[pick(random, keys.length ? keys : ['x'])]
        if (random() < 0.1) copy[pick(random, ['blocks', 'wires', 'variables', 'sweep', '__proto__', 'extra'])] = pick(random, atoms)
        return copy
      }
      return pick(random, atoms)
    }
    const seed = { ...base(), variables: { f0: '1 GHz' }, sweep: { start: '1 GHz', stop: '2 GHz', points: 11 }, blocks: [{ id: 'P1', type: 'port', params: { index: 1 } }, line('L1')], wires: [['P1.1', 'L1.1']] }
    let accepted = 0
    for (let i = 0; i < 10_000; i++) {
      const input = mutate(seed, 0)
      const parsed = parseNetworkDocument(input)
      if (!parsed.ok) {
        expect(parsed.problems.length).toBeGreaterThan(0)
        continue
      }
      accepted++
      const d = parsed.document
      expect(Array.isArray(d.blocks) && Array.isArray(d.wires)).toBe(true)
      expect(d.blocks.length).toBeLessThanOrEqual(DOCUMENT_LIMITS.blocks)
      for (const b of d.blocks) expect(b.id.length).toBeLessThanOrEqual(DOCUMENT_LIMITS.blockIdLength)
      expect((d.sweep?.points ?? 1)).toBeLessThanOrEqual(DOCUMENT_LIMITS.sweepPoints)
    }
    // The generator must produce both kinds, or it tests nothing.
    expect(accepted).toBeGreaterThan(100)
    expect(accepted).toBeLessThan(10_000)
  })
})
