import { describe, expect, it } from 'vitest'
import { seededRandom } from '../../../shared/solver/join-order'
import { gram, largestSingularValue, matrix, maxDiff, solveAt, type C } from './helpers'

type Block = { id: string; type: string; params: Record<string, unknown> }

/** A random network: lossless parts only, or with resistive and lossy parts too. */
function randomNetwork(seed: number, lossy: boolean): Record<string, unknown> {
  const random = seededRandom(seed)
  const pick = <T>(list: T[]): T => list[Math.floor(random() * list.length)]!
  const between = (lo: number, hi: number) => lo + (hi - lo) * random()
  const makers: Array<(id: string) => Block> = [
    id => ({ id, type: 'line', params: { impedance: between(20, 120), degrees: between(5, 200), at: 'f0', ...(lossy ? { lossDb: between(0, 0.5) } : {}) } }),
    id => ({ id, type: 'stub', params: { impedance: between(20, 120), degrees: between(5, 120), at: 'f0', end: pick(['open', 'short']) } }),
    id => ({ id, type: 'phase', params: { degrees: between(-180, 180), impedance: between(30, 80) } }),
    id => ({ id, type: 'hybrid90', params: { model: pick(['ideal', 'branch']), at: 'f0', couplingDb: between(2, 10), impedance: between(40, 60) } }),
    id => ({ id, type: 'hybrid180', params: { model: pick(['ideal', 'ring']), at: 'f0' } }),
    id => ({ id, type: 'series', params: pick([{ inductance: between(1e-9, 8e-9) }, { capacitance: between(0.5e-12, 5e-12) }]) }),
    id => ({ id, type: 'load', params: pick([{ inductance: between(1e-9, 8e-9) }, { capacitance: between(0.5e-12, 5e-12) }]) }),
  ]
  if (lossy) {
    makers.push(
      id => ({ id, type: 'attenuator', params: { db: between(0.5, 6) } }),
      id => ({ id, type: 'series', params: { resistance: between(5, 200), inductance: between(0, 5e-9) } }),
      id => ({ id, type: 'load', params: { resistance: between(10, 200) } }),
      id => ({ id, type: 'divider', params: { model: pick(['ideal', 'lines']), at: 'f0', ratioDb: between(-4, 4) } }),
    )
  }
  const terminals: Record<string, number> = { line: 2, stub: 1, phase: 2, hybrid90: 4, hybrid180: 4, series: 2, load: 1, attenuator: 2, divider: 3 }
  const blocks: Block[] = []
  const ends: string[] = []
  const count = 3 + Math.floor(random() * 6)
  for (let b = 0; b < count; b++) {
    const block = pick(makers)(`B${b}`)
    blocks.push(block)
    for (let t = 1; t <= terminals[block.type]!; t++) ends.push(`${block.id}.${t}`)
  }
  // Shuffle the terminals and tie them into nets of two or three; a few stay open.
  for (let i = ends.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1))
    ;[ends[i], ends[j]] = [ends[j]!, ends[i]!]
  }
  const wires: Array<[string, string]> = []
  const ports = 2 + Math.floor(random() * 3)
  for (let p = 1; p <= ports; p++) {
    blocks.push({ id: `P${p}`, type: 'port', params: { index: p, impedance: pick([50, 50, 25, 75]) } })
    wires.push([`P${p}.1`, ends.pop()!])
  }
  while (ends.length >= 2) {
    const size = random() < 0.25 && ends.length >= 3 ? 3 : 2
    const net = ends.splice(0, size)
    for (let i = 1; i < net.length; i++) wires.push([net[0]!, net[i]!])
    if (random() < 0.15) ends.shift()
  }
  return { format: 'portwright.network', version: 1, referenceImpedance: 50, variables: { f0: '2.45 GHz' }, blocks, wires }
}

// Off the design frequency: at exactly f0 ideal parts can trap a resonance (see singular.test.ts).
const FREQUENCIES = [0.731e9, 1.913e9, 2.4517e9, 3.377e9]

/** The first network from this seed on that can be solved at every test frequency. */
function solvableNetwork(seed: number, lossy: boolean): Record<string, unknown> {
  for (let attempt = 0; attempt < 50; attempt++) {
    const network = randomNetwork(seed + 1000 * attempt, lossy)
    try {
      solveAt(network, FREQUENCIES)
      return network
    } catch {
      // Frequency-independent ideal blocks wired onto themselves can be singular everywhere; draw again.
    }
  }
  throw new Error(`no solvable network from seed ${seed}`)
}
const transpose = (m: C[][]) => m.map((row, i) => row.map((_, j) => m[j]![i]!))
const identity = (n: number): C[][] => Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j): C => [i === j ? 1 : 0, 0]))

describe('identities on random networks', () => {
  for (let seed = 1; seed <= 40; seed++) {
    const lossy = seed % 2 === 0
    it(`network ${seed} (${lossy ? 'with losses' : 'lossless'}): reciprocal, passive${lossy ? '' : ', lossless'}, same S in any join order`, () => {
      const network = solvableNetwork(seed, lossy)
      const auto = solveAt(network, FREQUENCIES)
      const byDocument = solveAt(network, FREQUENCIES, { joinOrder: 'document' })
      const shuffled = solveAt(network, FREQUENCIES, { joinOrder: 'random', seed: seed * 7 })
      for (let k = 0; k < FREQUENCIES.length; k++) {
        const m = matrix(auto, k)
        // Reciprocal networks have S = Sᵀ (Pozar, 4th ed., §4.3).
        expect(maxDiff(m, transpose(m))).toBeLessThan(1e-10)
        // Passive networks have all singular values ≤ 1 (Pozar, 4th ed., §4.3, passive networks [memory for the section]).
        expect(largestSingularValue(m)).toBeLessThanOrEqual(1 + 1e-9)
        // Lossless networks have SᴴS = I (Pozar, 4th ed., eq. 4.53).
        if (!lossy) expect(maxDiff(gram(m), identity(m.length))).toBeLessThan(1e-9)
        // The answer cannot depend on the order of joining (common practice).
        expect(maxDiff(m, matrix(byDocument, k))).toBeLessThan(1e-9)
        expect(maxDiff(m, matrix(shuffled, k))).toBeLessThan(1e-9)
      }
    })
  }

  it('lossy networks really lose power (the losslessness check can fail)', () => {
    const m = matrix(solveAt(randomNetwork(2, true), [2.45e9]))
    // Common practice: an attenuator or resistor in the path makes SᴴS ≠ I.
    const any = [2, 4, 6, 8].some(seed => maxDiff(gram(matrix(solveAt(randomNetwork(seed, true), [2.45e9]))), identity(m.length)) > 1e-3)
    expect(any).toBe(true)
  })
})
