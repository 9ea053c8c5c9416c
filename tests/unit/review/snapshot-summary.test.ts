import { describe, expect, it } from 'vitest'
import { snapshotSummary } from '../../../shared/review/snapshot-summary'
import { summaryLines } from '../../../shared/review/summary-lines'
import { branchLineHybrid, wilkinsonDivider } from '../../../shared/examples/index'
import type { NetworkDocument } from '../../../shared/network/types'

describe('snapshot summary', () => {
  it('branch-line hybrid at f0: −3.01 dB to ports 2 and 3, 90° apart, port 4 isolated, all matched', () => {
    // Pozar, Microwave Engineering, 4th ed., §7.5: ideal branch-line at f0, S21 = −j/√2, S31 = −1/√2, S41 = 0, S11 = 0.
    const s = snapshotSummary(branchLineHybrid)
    expect(s.solved).toBe(true)
    expect(s.centre).toEqual({ frequency: 2.45e9, from: 'f0' })
    expect(s.ports).toBe(4)
    for (const r of s.returnLoss!) expect(r.db === null || r.db > 100).toBe(true)
    const by = new Map(s.transfer!.map(t => [t.to, t]))
    expect(by.get(2)!.db).toBeCloseTo(-3.0103, 3)
    expect(by.get(2)!.phaseDeg).toBeCloseTo(-90, 6)
    expect(by.get(3)!.db).toBeCloseTo(-3.0103, 3)
    expect(Math.abs(by.get(3)!.phaseDeg)).toBeCloseTo(180, 6)
    expect(by.get(4)!.db === null || by.get(4)!.db! < -100).toBe(true)
    expect(s.balance).toMatchObject({ from: 1, a: 2, b: 3 })
    expect(s.balance!.imbalanceDb).toBeCloseTo(0, 6)
    expect(s.balance!.phaseDifferenceDeg).toBeCloseTo(90, 6)
    expect(s.bandwidth).toBeNull()
  })

  it('takes the centre and the band from the spec when the document has one', () => {
    const withSpec: NetworkDocument = { ...structuredClone(branchLineHybrid), spec: { center: 2.45e9, conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] } }
    const s = snapshotSummary(withSpec)
    expect(s.centre).toEqual({ frequency: 2.45e9, from: 'spec' })
    expect(s.bandwidth?.ok).toBe(true)
    if (!s.bandwidth?.ok) return
    // The band is centred on f0 for this symmetric TEM design and is a real fraction of it (common practice: ~10 % at 20 dB RL for one section).
    expect(s.bandwidth.low).toBeLessThan(2.45e9)
    expect(s.bandwidth.high).toBeGreaterThan(2.45e9)
    expect(s.bandwidth.fractional).toBeGreaterThan(0.05)
    expect(s.bandwidth.fractional).toBeLessThan(0.2)
  })

  it('says why a spec it cannot read gives no band', () => {
    const s = snapshotSummary({ ...structuredClone(branchLineHybrid), spec: { center: -1, conditions: [] } })
    expect(s.bandwidth).toMatchObject({ ok: false })
    expect(s.bandwidth && !s.bandwidth.ok && s.bandwidth.reason).toMatch(/spec cannot be read \(spec.center: must be greater than zero/)
  })

  it('reads a contract 1.1 spec whose centre is an expression of the document\'s variables', () => {
    const withSpec: NetworkDocument = { ...structuredClone(branchLineHybrid), version: 1.1, spec: { center: 'f0', band: { start: '2.4 GHz', stop: '2.5 GHz' }, conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] } }
    const s = snapshotSummary(withSpec)
    expect(s.centre).toEqual({ frequency: 2.45e9, from: 'spec' })
    expect(s.bandwidth?.ok).toBe(true)
  })

  it('in-phase divider: equal split in phase, so 0 dB imbalance and 0° difference', () => {
    // Pozar, 4th ed., §7.3: equal-split Wilkinson at f0, S21 = S31 = −j/√2.
    const s = snapshotSummary(wilkinsonDivider)
    expect(s.solved).toBe(true)
    expect(s.balance!.imbalanceDb).toBeCloseTo(0, 6)
    expect(s.balance!.phaseDifferenceDeg).toBeCloseTo(0, 6)
  })

  it('a document that cannot be solved still gives a summary that says why', () => {
    const broken: NetworkDocument = { ...structuredClone(branchLineHybrid), variables: { f0: 'nope GHz' } }
    const s = snapshotSummary(broken)
    expect(s.solved).toBe(false)
    expect(s.problem).toBeTruthy()
    expect(summaryLines(s)[0]).toMatch(/^Not solved: /)
  })

  it('writes the figures as lines of text with units', () => {
    const lines = summaryLines(snapshotSummary(branchLineHybrid))
    expect(lines[0]).toBe('At 2.450 GHz (centre from the variable f0), 4-port:')
    expect(lines).toContain('Balance S21/S31: 0.00 dB apart, 90.0° phase difference')
    expect(lines.at(-1)).toBe('No spec, so no bandwidth.')
  })
})
