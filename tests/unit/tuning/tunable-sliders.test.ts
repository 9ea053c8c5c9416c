import { describe, expect, it } from 'vitest'
import { branchLineTuning } from '../../../shared/examples/index'
import { prepareNetwork } from '../../../shared/solver/index'
import { shownValue, tunableSliders, writtenValue } from '../../../app/utils/tuning/tunableSliders'

describe('tune panel sliders', () => {
  it('gives each tunable its range and current value, and says why a bad one has no slider', () => {
    const document = branchLineTuning(false)
    document.tunables = { ...document.tunables, 'Z0': { min: '40 ohm', max: '60 ohm' }, 'T12.nothing': { min: 1, max: 2 } }
    const prepared = prepareNetwork(document)
    if (!prepared.ok) throw new Error('example did not prepare')
    const sliders = tunableSliders(document, prepared.evaluated)
    expect(sliders.find(s => s.key === 'T12.impedance')).toMatchObject({ min: 25, max: 50, value: 50 / Math.SQRT2 })
    const z0 = sliders.find(s => s.key === 'Z0')!
    expect(z0).toMatchObject({ min: 40, max: 60, value: 50 })
    expect(writtenValue(z0.target!, 45)).toBe('45 ohm')
    expect(shownValue(sliders[0]!.target!, 35.3553)).toBe('35.36 Ω')
    expect(sliders.find(s => s.key === 'T12.nothing')!.error).toMatch(/^block T12 \(line\) has no parameter "nothing"/)
    expect(tunableSliders(document, null)[0]!.error).toBe('waiting for the solver')
  })
})
