import { describe, expect, it } from 'vitest'
import { resolveSweep, sweepFrequencies } from '../../../shared/solver/index'

describe('sweep', () => {
  it('linear spacing includes both ends', () => {
    expect(Array.from(sweepFrequencies({ start: 1e9, stop: 2e9, points: 5, spacing: 'linear' }))).toEqual([1e9, 1.25e9, 1.5e9, 1.75e9, 2e9])
  })

  it('log spacing has a constant ratio', () => {
    const f = sweepFrequencies({ start: 1e6, stop: 1e9, points: 4, spacing: 'log' })
    expect(f[0]).toBe(1e6)
    expect(f[1]).toBeCloseTo(1e7, 0)
    expect(f[2]).toBeCloseTo(1e8, -1)
    expect(f[3]).toBe(1e9)
  })

  it('one point uses start; an override replaces fields', () => {
    expect(Array.from(sweepFrequencies({ start: 2e9, stop: 3e9, points: 1 }))).toEqual([2e9])
    expect(Array.from(sweepFrequencies({ start: 2e9, stop: 3e9, points: 11 }, { points: 3, stop: 4e9 }))).toEqual([2e9, 3e9, 4e9])
  })

  it('bad sweeps are problems naming the field', () => {
    const bad = resolveSweep({ start: 0, stop: 1e9, points: 0, spacing: 'log' })
    expect(bad.ok).toBe(false)
    if (!bad.ok) {
      expect(bad.problems.map(p => p.field).sort()).toEqual(['sweep.points', 'sweep.start'])
      expect(bad.problems.find(p => p.field === 'sweep.start')!.message).toMatch(/above 0 Hz for log/)
    }
    const missing = resolveSweep(undefined)
    expect(missing.ok).toBe(false)
    if (!missing.ok) expect(missing.problems.map(p => p.message)).toEqual([expect.stringMatching(/sweep\.start is missing/), expect.stringMatching(/sweep\.stop is missing/)])
    const backwards = resolveSweep({ start: 3e9, stop: 1e9, points: 3 })
    expect(backwards.ok).toBe(false)
    expect(() => sweepFrequencies({ start: 3e9, stop: 1e9, points: 3 })).toThrow(RangeError)
  })
})
