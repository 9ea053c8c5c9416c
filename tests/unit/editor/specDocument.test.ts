import { describe, expect, it } from 'vitest'
import { blankCondition, defaultSpec, meetsSpec, phaseTargetFor, writeSpec } from '../../../app/utils/editor/specDocument'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import type { SolvedData } from '../../../app/workers/protocol'

/**
 * An ideal quadrature hybrid at every frequency: S21 = −j/√2, S31 = −1/√2, matched, port 4 isolated
 * (Pozar, Microwave Engineering, 4th ed., §7.5, eq. 7.40: port 2 at −90°, port 3 at −180°).
 */
function idealHybrid(frequencies: number[]): SolvedData {
  const n = frequencies.length
  const re = new Float64Array(n * 16)
  const im = new Float64Array(n * 16)
  const r = Math.SQRT1_2
  const set = (k: number, i: number, j: number, a: number, b: number) => {
    re[(k * 4 + i - 1) * 4 + j - 1] = a
    im[(k * 4 + i - 1) * 4 + j - 1] = b
    re[(k * 4 + j - 1) * 4 + i - 1] = a
    im[(k * 4 + j - 1) * 4 + i - 1] = b
  }
  for (let k = 0; k < n; k++) {
    set(k, 2, 1, 0, -r); set(k, 3, 1, -r, 0); set(k, 4, 2, -r, 0); set(k, 4, 3, 0, -r)
  }
  return { ports: 4, impedances: [50, 50, 50, 50], frequencies: Float64Array.from(frequencies), re, im }
}

describe('spec in the document', () => {
  it('picks the phase target nearest the response, with the port order that makes it +90°', () => {
    expect(phaseTargetFor(88, [2, 3])).toEqual({ target: 90, to: [2, 3] })
    expect(phaseTargetFor(-91, [2, 3])).toEqual({ target: 90, to: [3, 2] })
    expect(phaseTargetFor(3, [2, 3])).toEqual({ target: 0, to: [2, 3] })
    expect(phaseTargetFor(-178, [2, 3])).toEqual({ target: 180, to: [2, 3] })
  })

  it('draws first defaults from the network: f0 as centre, port 1 as input, the two strongest outputs', () => {
    const doc = emptyDocument('Hybrid')
    doc.variables = { f0: '2.45 GHz' }
    const spec = defaultSpec(doc, idealHybrid([2e9, 2.45e9, 3e9]))
    expect(spec.center).toBe('f0')
    expect(spec.conditions.filter(c => c.measure === 'returnLoss')).toHaveLength(4)
    // S21 − S31 = −90° − (−180°) = +90° for the ideal hybrid.
    expect(spec.conditions).toContainEqual({ measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 5 })
    expect(spec.conditions).toContainEqual({ measure: 'amplitudeImbalance', from: 1, to: [2, 3], max: 0.5 })
  })

  it('takes the sweep middle without f0, and makes the document version 1.1 when written', () => {
    const doc = emptyDocument('Hybrid')
    const spec = defaultSpec(doc, idealHybrid([1e9, 3e9]))
    expect(spec.center).toBe(2e9)
    writeSpec(doc, spec)
    expect(doc.version).toBe(1.1)
    expect(doc.spec).toEqual(spec)
  })

  it('says whether every condition holds over the band', () => {
    const result = idealHybrid([2e9, 2.45e9, 3e9])
    const ok = meetsSpec(result, { center: 2.45e9, band: { start: 2e9, stop: 3e9 }, conditions: [{ measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 1 }] })
    expect(ok).toEqual({ meets: true, points: 3 })
    const bad = meetsSpec(result, { center: 2.45e9, conditions: [{ measure: 'phaseDifference', from: 1, to: [2, 3], target: 0, tolerance: 1 }] })
    expect(bad.meets).toBe(false)
    expect(bad.failing).toContain('phase')
    expect(blankCondition('vswr', 2)).toEqual({ measure: 'vswr', port: 1, max: 1.5 })
  })
})
