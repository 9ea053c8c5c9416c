import { describe, expect, it } from 'vitest'
import { envelopeFills, type YieldEnvelope } from '../../../app/utils/editor/envelopeFills'
import { withAlpha } from '../../../app/utils/editor/tracePalette'

const f = Float64Array.of(1e9, 2e9, 3e9)
const envelope = (trace: string, frequencies = f): YieldEnvelope => ({
  trace, frequencies,
  min: Float64Array.of(-5, -4, -3), max: Float64Array.of(-1, 0, 1),
  low: Float64Array.of(-4, -3, -2), high: Float64Array.of(-2, -1, 0),
  trials: 100, seed: 1,
})

describe('envelopeFills', () => {
  it('shades min–max and 5–95 % behind each plotted trace that has a spread, in its colour', () => {
    const fills = envelopeFills([envelope('S21'), envelope('S31')], [{ name: 'S11', colour: 'rgb(1, 2, 3)' }, { name: 'S21', colour: 'rgb(230, 159, 0)' }], f)
    expect(fills.map(x => x.label)).toEqual(['S21 min–max', 'S21 5–95 %'])
    expect(fills[0]!.low).toEqual(Float64Array.of(-5, -4, -3))
    expect(fills[0]!.high).toEqual(Float64Array.of(-1, 0, 1))
    expect(fills[1]!.low).toEqual(Float64Array.of(-4, -3, -2))
    expect(fills[0]!.colour).toBe('rgba(230, 159, 0, 0.12)')
    expect(fills[1]!.colour).toBe('rgba(230, 159, 0, 0.28)')
  })

  it('draws nothing for a spread recorded over another sweep', () => {
    expect(envelopeFills([envelope('S21', Float64Array.of(1e9, 2e9))], [{ name: 'S21', colour: 'rgb(0, 0, 0)' }], f)).toEqual([])
    expect(envelopeFills([envelope('S21', Float64Array.of(1e9, 2.5e9, 3e9))], [{ name: 'S21', colour: 'rgb(0, 0, 0)' }], f)).toEqual([])
  })

  it('makes palette colours translucent and leaves other forms alone', () => {
    expect(withAlpha('rgb(86, 180, 233)', 0.5)).toBe('rgba(86, 180, 233, 0.5)')
    expect(withAlpha('#123456', 0.5)).toBe('#123456')
  })
})
