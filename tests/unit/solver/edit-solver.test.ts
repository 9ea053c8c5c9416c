// Incremental solving after an edit must give the S of a full solve of the edited document.
// The reference is the solver's own full solve (whose physics the other solver tests check
// against published sources); the two differ only in join order, so they agree to rounding.
import { describe, expect, it } from 'vitest'
import { EditSolver, JoinPlanCache, prepareNetwork, solveNetwork, type EditSolveMode, type PrepareOptions } from '../../../shared/solver/index'
import { GOLDEN_NETWORKS } from './golden/networks'
import { doc, port } from './helpers'

const TOLERANCE = 1e-12

type Doc = { blocks: Array<{ id: string; type: string; params: Record<string, unknown> }>; referenceImpedance?: unknown; variables?: Record<string, string> }

/** Solves `document` through the edit solver and fully; checks they agree and returns the mode. */
function step(solver: EditSolver, document: unknown, frequencies: Float64Array, options: PrepareOptions = {}): EditSolveMode {
  const prepared = prepareNetwork(document, options)
  if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
  const edited = solver.solve(prepared.network, prepared.evaluated, frequencies)
  const again = prepareNetwork(document, options)
  if (!again.ok) throw new Error('the document prepared once but not twice')
  const full = solveNetwork(again.network, frequencies)
  expect(edited.ok).toBe(full.ok)
  if (!edited.ok || !full.ok) return edited.mode
  expect(edited.warnings).toEqual(full.warnings)
  const a = edited.result, b = full.result
  expect(a.re.length).toBe(b.re.length)
  let worst = 0
  for (let i = 0; i < a.re.length; i++) worst = Math.max(worst, Math.hypot(a.re[i]! - b.re[i]!, a.im[i]! - b.im[i]!))
  expect(worst).toBeLessThanOrEqual(TOLERANCE)
  return edited.mode
}

/** The first numeric parameter of a block that accepts a plain number, scaled. */
function edit(document: Doc, blockId: string, factor: number, options: PrepareOptions): Doc | undefined {
  const prepared = prepareNetwork(document, options)
  const values = prepared.evaluated.blocks[blockId] ?? {}
  for (const [field, evaluated] of Object.entries(values)) {
    if (typeof evaluated.value !== 'number' || evaluated.value === 0 || field === 'at') continue
    const copy = structuredClone(document)
    copy.blocks.find(b => b.id === blockId)!.params[field] = evaluated.value * factor
    if (prepareNetwork(copy, options).ok) return copy
  }
  return undefined
}

/** Up to three non-port blocks an edit can change: the first, one in the middle and the last. */
function editableBlocks(document: Doc, options: PrepareOptions): string[] {
  const ids = document.blocks.filter(b => b.type !== 'port').map(b => b.id)
  const found = (list: string[]) => list.find(id => edit(document, id, 1.1, options))
  const middle = Math.floor(ids.length / 2)
  return [...new Set([found(ids), found(ids.slice(middle)), found([...ids].reverse())])].filter((id): id is string => id !== undefined)
}

/** The golden frequencies, and a 70-point sweep over the same band (three runs of frequencies, the last one partial). */
function sweeps(frequencies: number[]): Float64Array[] {
  const lo = Math.min(...frequencies), hi = Math.max(...frequencies)
  return [Float64Array.from(frequencies), Float64Array.from({ length: 70 }, (_, k) => lo + ((hi - lo) * k) / 69)]
}

describe('incremental solving after an edit equals the full solve', () => {
  for (const [name, network] of Object.entries(GOLDEN_NETWORKS)) {
    const options = network.options ?? {}
    // At an exactly singular frequency the incremental run gives up and the full solve answers.
    const singular = name.includes('singular')
    it(`${name}: edits of one block, then another, then a structure change`, () => {
      const start = network.document as Doc
      const blocks = editableBlocks(start, options)
      expect(blocks.length).toBeGreaterThan(0)
      for (const frequencies of sweeps(network.frequencies)) {
        const solver = new EditSolver({ plans: new JoinPlanCache() })
        const modes: EditSolveMode[] = [step(solver, start, frequencies, options)]
        let current = start
        for (const id of blocks) {
          for (const factor of [1.1, 0.93, 1.27]) {
            current = edit(current, id, factor, options)!
            modes.push(step(solver, current, frequencies, options))
          }
        }
        // A new reference impedance changes what every join sees: a full solve, then edits are incremental again.
        const moved = { ...structuredClone(current), referenceImpedance: 51 }
        modes.push(step(solver, moved, frequencies, options))
        modes.push(step(solver, edit(moved, blocks[0]!, 1.05, options)!, frequencies, options))
        modes.push(step(solver, edit(edit(moved, blocks[0]!, 1.05, options)!, blocks[0]!, 1.05, options)!, frequencies, options))
        if (singular && frequencies.length === network.frequencies.length) {
          expect(modes.every(m => m === 'full')).toBe(true)
          continue
        }
        const expected: EditSolveMode[] = ['full', ...blocks.flatMap((): EditSolveMode[] => ['joined-last', 'incremental', 'incremental']), 'full', 'joined-last', 'incremental']
        expect(modes).toEqual(expected)
      }
    }, 120_000)
  }
})

describe('what falls back to a full solve', () => {
  const frequencies = Float64Array.from({ length: 40 }, (_, k) => 1e9 + k * 5e7)
  const chain = (zA: string, zB: string, extra: Record<string, string> = {}) => doc(
    [port(1), port(2),
      { id: 'A', type: 'line', params: { impedance: 'Za', degrees: 90, at: 'f0' } },
      { id: 'B', type: 'line', params: { impedance: 'Zb', degrees: 90, at: 'f0' } },
      { id: 'C', type: 'line', params: { impedance: 'Zb', degrees: 45, at: 'f0' } }],
    [['P1.1', 'A.1'], ['A.2', 'B.1'], ['B.2', 'C.1'], ['C.2', 'P2.1']],
    { variables: { f0: '2.45 GHz', Za: zA, Zb: zB, ...extra } },
  )

  it('a variable only one block uses is an edit of that block', () => {
    const solver = new EditSolver()
    expect(step(solver, chain('40 ohm', '60 ohm'), frequencies)).toBe('full')
    expect(step(solver, chain('41 ohm', '60 ohm'), frequencies)).toBe('joined-last')
    expect(step(solver, chain('42 ohm', '60 ohm'), frequencies)).toBe('incremental')
  })

  it('a variable two blocks use, or a new sweep, is solved fully', () => {
    const solver = new EditSolver()
    step(solver, chain('40 ohm', '60 ohm'), frequencies)
    step(solver, chain('41 ohm', '60 ohm'), frequencies)
    expect(step(solver, chain('41 ohm', '61 ohm'), frequencies)).toBe('full')
    expect(step(solver, chain('42 ohm', '61 ohm'), frequencies)).toBe('joined-last')
    // Other frequencies: the kept rest is joined again for them.
    expect(step(solver, chain('43 ohm', '61 ohm'), frequencies.subarray(0, 33))).toBe('incremental')
    expect(step(solver, chain('44 ohm', '61 ohm'), frequencies.subarray(0, 33))).toBe('incremental')
  })

  it('an unused variable changes nothing and the kept rest is reused', () => {
    const solver = new EditSolver()
    step(solver, chain('40 ohm', '60 ohm'), frequencies)
    step(solver, chain('41 ohm', '60 ohm'), frequencies)
    expect(step(solver, chain('41 ohm', '60 ohm', { spare: '3' }), frequencies)).toBe('incremental')
  })

  it('after reset the solve starts over', () => {
    const solver = new EditSolver()
    step(solver, chain('40 ohm', '60 ohm'), frequencies)
    step(solver, chain('41 ohm', '60 ohm'), frequencies)
    solver.reset()
    expect(step(solver, chain('42 ohm', '60 ohm'), frequencies)).toBe('full')
    expect(step(solver, chain('43 ohm', '60 ohm'), frequencies)).toBe('joined-last')
  })

  it('a memory limit of zero keeps nothing', () => {
    const solver = new EditSolver({ maxKeptBytes: 0 })
    step(solver, chain('40 ohm', '60 ohm'), frequencies)
    expect(step(solver, chain('41 ohm', '60 ohm'), frequencies)).toBe('full')
    expect(step(solver, chain('42 ohm', '60 ohm'), frequencies)).toBe('full')
  })
})
