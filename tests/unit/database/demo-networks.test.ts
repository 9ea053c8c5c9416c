import { describe, expect, it } from 'vitest'
import { demoNetworks } from '../../../server/database/seeders/demo-networks'
import { parseNetworkDocument } from '../../../shared/network/schema'
import { solveDocument } from '../../../shared/solver'

const all = Object.values(demoNetworks).flat()

/** |S(i,j)| in dB at frequency index k. */
function db(result: { ports: number; re: Float64Array; im: Float64Array }, k: number, i: number, j: number): number {
  const idx = (k * result.ports + i) * result.ports + j
  return 20 * Math.log10(Math.hypot(result.re[idx]!, result.im[idx]!))
}

describe('demo networks', () => {
  it.each(all.map(doc => [doc.name, doc] as const))('%s follows the contract and solves', (_name, doc) => {
    expect(parseNetworkDocument(doc).ok).toBe(true)
    const solved = solveDocument(doc)
    expect(solved.ok ? [] : solved.problems).toEqual([])
  })

  it('the branch-line demo splits −3.01 dB to ports 2 and 3 at 2.45 GHz', () => {
    // Ideal quadrature hybrid at f0: |S21| = |S31| = 1/√2 (Pozar, Microwave Engineering, 4th ed., §7.5).
    const doc = demoNetworks.beam[0]!
    const solved = solveDocument(doc, { sweep: { start: 2.45e9, stop: 2.45e9, points: 1 } })
    if (!solved.ok) throw new Error(JSON.stringify(solved.problems))
    expect(db(solved.result, 0, 1, 0)).toBeCloseTo(-3.0103, 3)
    expect(db(solved.result, 0, 2, 0)).toBeCloseTo(-3.0103, 3)
    expect(db(solved.result, 0, 3, 0)).toBeLessThan(-60)
  })
})
