import { describe, expect, it } from 'vitest'
import { readFileSync } from 'node:fs'
import { chunkMessageId } from '../../../server/jobs/queue'
import runChunk, { chunkRange } from '../../../server/jobs/run-chunk'

const document = JSON.parse(readFileSync('shared/examples/branch-line-tolerances.json', 'utf8'))

describe('job chunks', () => {
  it('cuts trials into consecutive ranges that cover the run once, the last one short', () => {
    const p = { trials: 2500, chunkTrials: 1000 }
    expect([0, 1, 2].map(i => chunkRange(p, i))).toEqual([{ from: 0, to: 1000 }, { from: 1000, to: 2000 }, { from: 2000, to: 2500 }])
  })

  it('names each (job, chunk) by one stable uuid, different for every chunk', () => {
    const job = '2f1c7f52-6a3e-4b7e-9a34-0f0f4d3c2b1a'
    const a = chunkMessageId(job, 0)
    expect(a).toBe(chunkMessageId(job, 0))
    expect(a).not.toBe(chunkMessageId(job, 1))
    expect(a).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-5[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/)
  })

  it('chunks of a tolerance run add up to the same count as the run in one piece, whatever the chunk size', () => {
    const whole = runChunk({ parameters: { kind: 'tolerance', trials: 60, seed: 7, chunkTrials: 60 }, document, networks: [], chunkIndex: 0 })
    let passed = 0
    for (let i = 0; i < 3; i++) {
      const part = runChunk({ parameters: { kind: 'tolerance', trials: 60, seed: 7, chunkTrials: 25 }, document, networks: [], chunkIndex: i })
      if (!part.ok) throw new Error(part.problems.join('; '))
      passed += part.passed
    }
    expect(whole.ok && whole.trials).toBe(60)
    expect(whole.ok && whole.passed).toBe(passed)
  })

  it('names what is wrong with a document that cannot be run', () => {
    const outcome = runChunk({ parameters: { kind: 'tolerance', trials: 10, seed: 1, chunkTrials: 10 }, document: { ...document, spec: undefined }, networks: [], chunkIndex: 0 })
    expect(outcome.ok).toBe(false)
    expect(!outcome.ok && outcome.problems.join(' ')).toMatch(/spec/)
  })
})
