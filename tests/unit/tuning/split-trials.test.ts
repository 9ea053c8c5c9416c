import { describe, expect, it } from 'vitest'
import { splitTrials } from '../../../app/utils/tuning/splitTrials'

describe('splitTrials', () => {
  it('covers every trial index once, in order, in near-equal ranges', () => {
    expect(splitTrials(10, 3)).toEqual([{ from: 0, to: 3 }, { from: 3, to: 6 }, { from: 6, to: 10 }])
    for (const [trials, parts] of [[1000, 8], [7, 2], [1, 4], [5, 5]] as const) {
      const ranges = splitTrials(trials, parts)
      expect(ranges[0]!.from).toBe(0)
      expect(ranges.at(-1)!.to).toBe(trials)
      ranges.forEach((r, i) => {
        expect(r.to).toBeGreaterThan(r.from)
        if (i) expect(r.from).toBe(ranges[i - 1]!.to)
      })
      expect(ranges.length).toBe(Math.min(parts, trials))
    }
  })
})
