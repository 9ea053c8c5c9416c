import { describe, expect, it } from 'vitest'
import { frequencyTickLabel, isDecade, logTicks } from '../../../app/utils/editor/logAxis'
import { balanceAxisRange } from '../../../app/utils/editor/balanceRange'
import { deltaText, readoutText } from '../../../app/utils/editor/markerReadout'

describe('log frequency axis', () => {
  it('ticks every decade and the 2 and 5 between, exactly within the sweep', () => {
    expect(logTicks(10e6, 10e9)).toEqual([1e7, 2e7, 5e7, 1e8, 2e8, 5e8, 1e9, 2e9, 5e9, 1e10])
    expect(logTicks(15e6, 3e9)[0]).toBe(2e7)
    expect(logTicks(15e6, 3e9).at(-1)).toBe(2e9)
  })

  it('uses 1…9 per decade for a span under a decade, and even steps for a very short one', () => {
    expect(logTicks(1e9, 5e9)).toEqual([1e9, 2e9, 3e9, 4e9, 5e9])
    const short = logTicks(2.3e9, 2.6e9)
    expect(short.length).toBeGreaterThanOrEqual(3)
    expect(short.every(v => v >= 2.3e9 && v <= 2.6e9)).toBe(true)
  })

  it('labels ticks with SI prefixes and marks decades', () => {
    expect(frequencyTickLabel(1e7)).toBe('10 MHz')
    expect(frequencyTickLabel(2e9)).toBe('2 GHz')
    expect(frequencyTickLabel(2.5e9)).toBe('2.5 GHz')
    expect(frequencyTickLabel(500e6)).toBe('500 MHz')
    expect(isDecade(1e8)).toBe(true)
    expect(isDecade(2e8)).toBe(false)
  })
})

describe('balance axes', () => {
  it('keep the data and the target inside, with at least ±0.5 dB and ±5°', () => {
    const flat = balanceAxisRange(Float64Array.from([0.01, 0.02]), 0, 0.5)
    expect(flat.max - flat.min).toBeCloseTo(1, 9)
    expect(flat.min).toBeLessThanOrEqual(0)
    const wide = balanceAxisRange(Float64Array.from([80, 100, Number.NaN]), 90, 5)
    expect(wide.min).toBeLessThan(80)
    expect(wide.max).toBeGreaterThan(100)
    const offTarget = balanceAxisRange(Float64Array.from([1, 1.2]), -3, 0.5)
    expect(offTarget.min).toBeLessThan(-3)
  })
})

describe('marker readouts', () => {
  it('follow the plotted quantity and give differences in its terms', () => {
    expect(readoutText('db', -3.0103)).toBe('−3.01 dB')
    expect(readoutText('vswr', 1.5)).toBe('1.500')
    expect(readoutText('delay', 1.25e-9)).toBe('1.250 ns')
    expect(readoutText('phase', -90)).toBe('−90.0°')
    // Wrapped phase difference on the circle: from +170° to −170° is +20°.
    expect(deltaText('phase', 170, -170)).toBe('+20.0°')
    expect(deltaText('db', -3, -10)).toBe('−7.00 dB')
  })
})

describe('markers saved with the network', () => {
  it('are written under view.markers beside other view keys and read back checked', async () => {
    const { emptyDocument } = await import('../../../app/utils/editor/emptyDocument')
    const { saveMarkers, savedMarkerFrequencies, MAX_SAVED_MARKERS } = await import('../../../app/utils/editor/savedMarkers')
    const doc = emptyDocument('Markers')
    expect(savedMarkerFrequencies(doc)).toBeNull()
    doc.view = { zoom: 2 }
    saveMarkers(doc, [2.45e9, 1e9])
    expect(doc.view).toEqual({ zoom: 2, markers: [{ frequency: 2.45e9 }, { frequency: 1e9 }] })
    expect(savedMarkerFrequencies(doc)).toEqual([2.45e9, 1e9])
    // A hostile or damaged list: only finite, non-negative frequencies, and no more than the limit.
    doc.view = { markers: [{ frequency: 'x' }, null, { frequency: -1 }, { frequency: 3e9 }, ...Array.from({ length: 40 }, () => ({ frequency: 1 }))] }
    const read = savedMarkerFrequencies(doc)!
    expect(read[0]).toBe(3e9)
    expect(read).toHaveLength(MAX_SAVED_MARKERS)
  })
})
