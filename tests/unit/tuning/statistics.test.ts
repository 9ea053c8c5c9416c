import { describe, expect, it } from 'vitest'
import { branchLineTuning } from '../../../shared/examples/index'
import { histogram, percentile, prepareTuning, rankTolerances, resolveTolerances, runTrials, traceEnvelope, valuesAtFrequency } from '../../../shared/tuning/index'

describe('percentiles, envelopes and histograms', () => {
  it('percentile interpolates between order statistics (Hyndman & Fan 1996, definition 7)', () => {
    // Worked by hand for 1…5: h = (n − 1)p; p = 25 % → h = 1 → 2; p = 10 % → h = 0.4 → 1.4.
    const sorted = Float64Array.of(1, 2, 3, 4, 5)
    expect(percentile(sorted, 25)).toBe(2)
    expect(percentile(sorted, 10)).toBeCloseTo(1.4, 12)
    expect(percentile(sorted, 100)).toBe(5)
    expect(percentile(new Float64Array(0), 50)).toBeNaN()
  })

  it('envelope per frequency leaves out unsolved (NaN) trials', () => {
    // Three trials × two frequencies, trial-major.
    const values = Float64Array.of(1, 10, 3, Number.NaN, 2, 30)
    const envelope = traceEnvelope(values, 2, [50])
    expect(Array.from(envelope.min)).toEqual([1, 10])
    expect(Array.from(envelope.max)).toEqual([3, 30])
    expect(Array.from(envelope.percentiles[50]!)).toEqual([2, 20])
  })

  it('histogram puts the top value in the last bin and counts every value once', () => {
    const h = histogram([0, 0.5, 1, 1.5, 2, Number.NaN], 4)
    expect(Array.from(h.edges)).toEqual([0, 0.5, 1, 1.5, 2])
    expect(Array.from(h.counts)).toEqual([1, 1, 1, 2])
    const same = histogram([3, 3], 2)
    expect(Array.from(same.counts)).toEqual([0, 2])
  })

  it('values at the centre frequency come from the nearest recorded frequency', () => {
    const picked = valuesAtFrequency(Float64Array.of(1, 2, 3, 4, 5, 6), Float64Array.of(1e9, 2e9, 3e9), 2.1e9)
    expect(Array.from(picked)).toEqual([2, 5])
  })
})

describe('tolerance ranking', { timeout: 120_000 }, () => {
  it('ranks the costliest tolerance first; a spread-free key costs nothing', () => {
    const document = branchLineTuning(false)
    // One arm's length off by up to 8° against the example's small spreads, plus one entry with no spread.
    document.tolerances = { ...document.tolerances, 'T43.degrees': { absolute: '8 deg' }, 'BR14.impedance': { relative: 0 } }
    const prepared = prepareTuning(document)
    if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
    const spreads = resolveTolerances(prepared.setup)
    if (!spreads.ok) throw new Error(spreads.problems.map(p => p.message).join('\n'))
    const ranking = rankTolerances(prepared.setup, spreads.spreads, { seed: 2, trials: 60 })
    expect(ranking).toHaveLength(6)
    expect(ranking.find(c => c.key === 'BR14.impedance')).toMatchObject({ passed: 60, yield: 1 })
    for (let i = 1; i < ranking.length; i++) expect(ranking[i]!.yield).toBeGreaterThanOrEqual(ranking[i - 1]!.yield)
    // Something costs yield here, and each entry is the run with that key alone active.
    expect(ranking[0]!.key).toBe('T43.degrees')
    expect(ranking[0]!.yield).toBeLessThan(1)
    const alone = runTrials(prepared.setup, spreads.spreads, { seed: 2, to: 60, active: new Set([ranking[0]!.key]) })
    expect(alone.passed).toBe(ranking[0]!.passed)
  })

  it('envelope of S21 over a run brackets the nominal at the centre', () => {
    const prepared = prepareTuning(branchLineTuning(false))
    if (!prepared.ok) throw new Error('example did not prepare')
    const spreads = resolveTolerances(prepared.setup)
    if (!spreads.ok) throw new Error('tolerances did not resolve')
    const run = runTrials(prepared.setup, spreads.spreads, { seed: 4, to: 40, traces: [{ to: 2, from: 1, form: 'magnitudeDb' }] })
    const points = run.frequencies.length
    const envelope = traceEnvelope(run.traces[0]!, points)
    const centre = valuesAtFrequency(run.traces[0]!, run.frequencies, 2.45e9)
    // Ideal equal split at f0: −3.01 dB (Pozar, Microwave Engineering, 4th ed., §7.5); the spread straddles it.
    const k = run.frequencies.indexOf(2.45e9)
    expect(envelope.min[k]!).toBeLessThan(-3.0103)
    expect(envelope.max[k]!).toBeGreaterThan(-3.0103)
    expect(Math.min(...centre)).toBe(envelope.min[k])
  })
})
