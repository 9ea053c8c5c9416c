import { describe, expect, it } from 'vitest'
import type { Evaluated } from '../../../shared/network/types'
import { shareEvaluated } from '../../../app/utils/editor/shareEvaluated'

function evaluation(z: number): Evaluated {
  return {
    variables: { f0: { value: 2e9, unit: 'Hz', display: '2 GHz' } },
    blocks: {
      TL1: { impedance: { value: z, unit: 'Ω', display: `${z} Ω` }, degrees: { value: 90, display: '90°' } },
      TL2: { impedance: { value: 62, unit: 'Ω', display: '62 Ω' } },
    },
    settings: { referenceImpedance: { value: 50, unit: 'Ω', display: '50 Ω' } },
  }
}

describe('sharing unchanged parts between evaluations', () => {
  it('keeps the previous evaluation when nothing changed', () => {
    const before = evaluation(40)
    expect(shareEvaluated(before, evaluation(40))).toBe(before)
  })

  it('gives new objects only along the path of what changed', () => {
    const before = evaluation(40)
    const after = shareEvaluated(before, evaluation(45))!
    expect(after).not.toBe(before)
    expect(after.blocks.TL1).not.toBe(before.blocks.TL1)
    expect(after.blocks.TL1!.impedance).toEqual({ value: 45, unit: 'Ω', display: '45 Ω' })
    expect(after.blocks.TL1!.degrees).toBe(before.blocks.TL1!.degrees)
    expect(after.blocks.TL2).toBe(before.blocks.TL2)
    expect(after.variables).toBe(before.variables)
    expect(after.settings).toBe(before.settings)
  })

  it('sees an error, a removed block or a new one as a change', () => {
    const before = evaluation(40)
    const failing = evaluation(40)
    failing.blocks.TL2!.impedance = { error: 'Unknown name Zb' }
    expect(shareEvaluated(before, failing)!.blocks.TL2).toEqual({ impedance: { error: 'Unknown name Zb' } })
    const fewer = evaluation(40)
    delete fewer.blocks.TL2
    expect(Object.keys(shareEvaluated(before, fewer)!.blocks)).toEqual(['TL1'])
    expect(shareEvaluated(null, before)).toBe(before)
    expect(shareEvaluated(before, null)).toBeNull()
  })
})
