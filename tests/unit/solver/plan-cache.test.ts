import { describe, expect, it } from 'vitest'
import { butlerMatrix4x4 } from '../../../shared/examples/butler-matrix-4x4'
import { JoinPlanCache, prepareNetwork, solveNetwork, type PrepareOptions } from '../../../shared/solver/index'
import { doc, port } from './helpers'

const FREQUENCIES = Float64Array.from({ length: 41 }, (_, k) => 1e9 + k * 5e7)

/** The raw bits of a result array, so equality means bit-identical (−0 and NaN included). */
const bits = (x: Float64Array) => Array.from(new BigUint64Array(x.buffer, x.byteOffset, x.length))

/** Everything a caller sees from prepare and solve, plus whether the join order came from the cache. */
function run(document: unknown, options: PrepareOptions = {}) {
  const prepared = prepareNetwork(document, options)
  if (!prepared.ok) return { seen: { problems: prepared.problems, evaluated: prepared.evaluated }, reused: false }
  const solved = solveNetwork(prepared.network, FREQUENCIES)
  const seen = solved.ok
    ? { evaluated: prepared.evaluated, warnings: solved.warnings, ports: solved.result.ports, impedances: solved.result.impedances, re: bits(solved.result.re), im: bits(solved.result.im) }
    : { evaluated: prepared.evaluated, problems: solved.problems }
  return { seen, reused: prepared.network.compiled.planReused }
}

/** Prepares `before` into a fresh cache, then `after` through it; checks `after` matches a fresh prepare and says whether the plan was reused. */
function reusedAfter(before: unknown, after: unknown): boolean {
  const plans = new JoinPlanCache()
  run(before, { plans })
  const cached = run(after, { plans })
  expect(cached.seen).toEqual(run(after).seen)
  return cached.reused
}

type Block = { id: string; type: string; params: Record<string, unknown> }
const line = (id: string, impedance: string, degrees: unknown = 90): Block => ({ id, type: 'line', params: { impedance, degrees, at: 'f0' } })

/** Two ports and six lines of alternating impedance (so every inner node is a junction), and a stub left unwired. */
function cascade(edit: (blocks: Block[], wires: Array<[string, string]>) => void = () => {}, variables: Record<string, string> = {}) {
  const blocks: Block[] = [port(1), port(2), ...[1, 2, 3, 4, 5, 6].map(k => line(`TL${k}`, k % 2 ? 'Za' : 'Zb', 60 + k)), { id: 'S', type: 'stub', params: { impedance: 70, degrees: 45, at: 'f0', end: 'open' } }]
  const wires: Array<[string, string]> = [['P1.1', 'TL1.1'], ...[1, 2, 3, 4, 5].map((k): [string, string] => [`TL${k}.2`, `TL${k + 1}.1`]), ['TL6.2', 'P2.1']]
  edit(blocks, wires)
  return doc(blocks, wires, { variables: { f0: '2.45 GHz', Za: '40 ohm', Zb: '62 ohm', ...variables } })
}
const block = (blocks: Block[], id: string) => blocks.find(b => b.id === id)!

describe('join plans kept across prepares', () => {
  it('a parameter edit reuses the join order and solves bit-identically to a fresh prepare', () => {
    expect(reusedAfter(cascade(), cascade(blocks => (block(blocks, 'TL3').params.degrees = 91.5)))).toBe(true)
    expect(reusedAfter(cascade(), cascade(undefined, { Za: '45 ohm', f0: '2.5 GHz' }))).toBe(true)
    const butler = structuredClone(butlerMatrix4x4)
    butler.blocks.find(b => b.id === 'L1')!.params.degrees = '270 + 50'
    expect(reusedAfter(butlerMatrix4x4, butler)).toBe(true)
  })

  it('a nested network (a divider built from lines) solves bit-identically through the cache', () => {
    const divider = (at: string) => doc(
      [port(1), port(2), port(3), { id: 'D', type: 'divider', params: { model: 'lines', at, ratioDb: 3 } }],
      [['P1.1', 'D.1'], ['D.2', 'P2.1'], ['D.3', 'P3.1']],
    )
    expect(reusedAfter(divider('2.45 GHz'), divider('2.6 GHz'))).toBe(true)
  })

  it('a topology change is detected and prepared fresh', () => {
    expect(reusedAfter(cascade(), cascade((_, wires) => wires.push(['TL2.2', 'S.1'])))).toBe(false)
    // A 40 Ω port meets TL1 (Za = 40 Ω) directly instead of through a junction.
    expect(reusedAfter(cascade(), cascade(blocks => (block(blocks, 'P1').params.impedance = '40 ohm')))).toBe(false)
    // A phase block is referred to 50 Ω, unlike the 40 Ω line it replaces, so it meets P1 directly.
    expect(reusedAfter(cascade(), cascade(blocks => Object.assign(block(blocks, 'TL1'), { type: 'phase', params: { degrees: 30 } })))).toBe(false)
    // A parameter edit can change the joins too: at Za = 50 Ω, P1 and TL1 share a reference.
    expect(reusedAfter(cascade(), cascade(undefined, { Za: '50 ohm' }))).toBe(false)
  })

  it('changes that leave every join as it was keep the plan, still bit-identical', () => {
    // P2 meets TL6 (62 Ω) through a junction at 50 Ω and at 75 Ω alike; only the junction's values differ.
    expect(reusedAfter(cascade(), cascade(blocks => (block(blocks, 'P2').params.impedance = '75 ohm')))).toBe(true)
    // An attenuator referred to the line's 40 Ω takes its place with the same terminals and references.
    expect(reusedAfter(cascade(), cascade(blocks => Object.assign(block(blocks, 'TL3'), { type: 'attenuator', params: { impedance: 'Za', db: 3 } })))).toBe(true)
  })

  it('reports problems exactly as a fresh prepare does', () => {
    // Evaluation problems stop before the join order.
    expect(reusedAfter(cascade(), cascade(blocks => (block(blocks, 'TL2').params.degrees = 'nonsense')))).toBe(false)
    // A singular join found while solving names the same frequency and blocks.
    const trapped = (degrees: number) => doc(
      [port(1), line('T', '50 ohm', 30), { id: 'LOOP', type: 'phase', params: { degrees } }, { id: 'OPEN', type: 'load', params: { end: 'open' } }],
      [['P1.1', 'T.1'], ['T.2', 'OPEN.1'], ['OPEN.1', 'LOOP.1'], ['LOOP.1', 'LOOP.2']],
    )
    const plans = new JoinPlanCache()
    run(trapped(350), { plans })
    const cached = run(trapped(360), { plans })
    expect(cached.reused).toBe(true)
    expect(cached.seen).toMatchObject({ problems: [expect.objectContaining({ frequency: FREQUENCIES[0] })] })
    expect(cached.seen).toEqual(run(trapped(360)).seen)
  })

  it('forgets the least recently used order beyond its capacity', () => {
    const cache = new JoinPlanCache(2)
    cache.set('a', [0])
    cache.set('b', [1])
    cache.get('a')
    cache.set('c', [2])
    expect([cache.get('a'), cache.get('b'), cache.get('c')]).toEqual([[0], undefined, [2]])
  })
})
