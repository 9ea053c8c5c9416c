// Generated join kernels against the generic ones: the same formulas (sub-network growth, see
// join-kernels.ts) in the same order, so the results must agree bit for bit on any input.
import { afterEach, describe, expect, it } from 'vitest'
import { codeGenerationAllowed, generatedLoop, generatedMerge } from '../../../shared/solver/generated-kernels'
import { closeLoop, kernelScratch, mergeNetworks } from '../../../shared/solver/join-kernels'

const C = 8
/** A deterministic pseudo-random buffer of an n-port at C frequencies, entries of magnitude below 0.6. */
function buffer(n: number, seed: number): [Float64Array, Float64Array] {
  let x = seed
  const next = () => ((x = (x * 16807) % 2147483647) / 2147483647 - 0.5) * 0.6
  return [Float64Array.from({ length: n * n * C }, next), Float64Array.from({ length: n * n * C }, next)]
}

describe('generated join kernels', () => {
  afterEach(() => { delete (globalThis as { window?: unknown }).window })

  for (const symmetric of [false, true]) {
    it(`merge: bit-identical to the generic kernel (${symmetric ? 'one triangle' : 'full matrices'}), fewer frequencies than the stride`, () => {
      for (const [m, k, n, l] of [[2, 1, 4, 0], [4, 2, 3, 2], [5, 0, 5, 4]] as const) {
        const [aR, aI] = buffer(m, 7 + m), [bR, bI] = buffer(n, 11 + n)
        const size = (m + n - 2) ** 2 * C
        const want = [new Float64Array(size), new Float64Array(size)], got = [new Float64Array(size), new Float64Array(size)]
        expect(mergeNetworks(aR, aI, m, k, bR, bI, n, l, want[0]!, want[1]!, symmetric, C - 3, C, kernelScratch(C))).toBe(-1)
        expect(generatedMerge(m, k, n, l, symmetric, C)(aR, aI, bR, bI, got[0]!, got[1]!, C - 3)).toBe(-1)
        expect(got).toEqual(want)
        expect(want[0]!.some(v => v !== 0)).toBe(true)
      }
    })

    it(`loop: bit-identical to the generic kernel (${symmetric ? 'one triangle' : 'full matrices'})`, () => {
      for (const [n, k, l] of [[3, 0, 2], [6, 4, 1], [8, 2, 3]] as const) {
        const [sR, sI] = buffer(n, 5 + n)
        const size = (n - 2) ** 2 * C
        const want = [new Float64Array(size), new Float64Array(size)], got = [new Float64Array(size), new Float64Array(size)]
        expect(closeLoop(sR, sI, n, k, l, want[0]!, want[1]!, symmetric, C, C, kernelScratch(C))).toBe(-1)
        expect(generatedLoop(n, k, l, symmetric, C)(sR, sI, sR, sI, got[0]!, got[1]!, C)).toBe(-1)
        expect(got).toEqual(want)
      }
    })
  }

  it('reports the same first singular frequency as the generic kernel', () => {
    // Two ideal opens facing each other (Γ = 1 both sides) give Δ = 1 − 1·1 = 0: derived by hand.
    const aR = new Float64Array(C).fill(0.5), aI = new Float64Array(C), bR = new Float64Array(C).fill(0.5), bI = new Float64Array(C)
    aR[3] = 1; bR[3] = 1
    const out = new Float64Array(0)
    expect(mergeNetworks(aR, aI, 1, 0, bR, bI, 1, 0, out, out, true, C, C, kernelScratch(C))).toBe(3)
    expect(generatedMerge(1, 0, 1, 0, true, C)(aR, aI, bR, bI, out, out, C)).toBe(3)
  })

  it('is used in Node and not where a browser window exists', () => {
    expect(codeGenerationAllowed()).toBe(true)
    ;(globalThis as { window?: unknown }).window = {}
    expect(codeGenerationAllowed()).toBe(false)
  })
})
