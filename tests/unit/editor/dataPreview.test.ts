import { describe, expect, it } from 'vitest'
import { dataPreviewTraces } from '../../../app/utils/editor/dataPreview'

describe('dataPreviewTraces', () => {
  it('reads S11 and S21 of a two-port in the solver layout (row-major S11 S12 S21 S22)', () => {
    // |S11| = 0.5 → −6.0206 dB; |S21| = 10 (3 + 4j → 5 at the second point): 20 dB and 13.979 dB
    // (20·log10 of a magnitude, common practice).
    const data = { ports: 2, frequencies: [1e9, 2e9], re: [0.5, 0, 10, 0, 0, 0.1, 3, 0], im: [0, 0, 0, 0, 0.5, 0, 4, 0] }
    const [s11, s21] = dataPreviewTraces(data)
    expect(s11!.name).toBe('S11')
    expect(s11!.values[0]).toBeCloseTo(-6.0206, 4)
    expect(s11!.values[1]).toBeCloseTo(-6.0206, 4)
    expect(s21!.name).toBe('S21')
    expect(s21!.values[0]).toBeCloseTo(20, 9)
    expect(s21!.values[1]).toBeCloseTo(13.9794, 4)
  })

  it('gives only S11 for a one-port', () => {
    expect(dataPreviewTraces({ ports: 1, frequencies: [1], re: [1], im: [0] }).map(t => t.name)).toEqual(['S11'])
  })
})
