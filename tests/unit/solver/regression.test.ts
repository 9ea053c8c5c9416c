// Speed work must not change results: S of every golden network stays within 1e-12 of the values
// the solver gave before the work (tests/unit/solver/golden/solver-golden.json, written by
// write-golden.ts at commit 5da7f44). The physics itself is checked against published sources
// in the other solver tests; this file only pins the numbers.
import { readFileSync } from 'node:fs'
import { afterAll, describe, expect, it } from 'vitest'
import { chooseKernels } from '../../../shared/solver/generated-kernels'
import { GOLDEN_NETWORKS } from './golden/networks'
import { solveGolden, type GoldenResult } from './golden/solve-golden'

const TOLERANCE = 1e-12
const golden = JSON.parse(readFileSync(new URL('./golden/solver-golden.json', import.meta.url), 'utf8')) as Record<string, GoldenResult>

afterAll(() => chooseKernels('auto'))

describe('solver results stay as pinned', () => {
  it('pins every golden network and nothing else', () => {
    expect(Object.keys(golden).sort()).toEqual(Object.keys(GOLDEN_NETWORKS).sort())
  })

  // Node solves with kernels generated per join; a browser worker, where code generation is forbidden, with the generic ones.
  for (const kernels of ['generated', 'generic'] as const) for (const [name, network] of Object.entries(GOLDEN_NETWORKS)) {
    it(`${name}, ${kernels} kernels: every S entry within 1e-12 of the pinned value`, () => {
      chooseKernels(kernels)
      const pinned = golden[name]!
      const now = solveGolden(network)
      expect(now.ports).toBe(pinned.ports)
      expect(now.frequencies).toEqual(pinned.frequencies)
      let worst = 0
      pinned.s.forEach((matrix, k) => matrix.forEach(([re, im], e) => {
        const [r, i] = now.s[k]![e]!
        worst = Math.max(worst, Math.hypot(r - re, i - im))
      }))
      expect(worst).toBeLessThanOrEqual(TOLERANCE)
      // A pinned matrix that is all zeros would pin nothing.
      expect(pinned.s.some(matrix => matrix.some(([re, im]) => re !== 0 || im !== 0))).toBe(true)
    })
  }
})
