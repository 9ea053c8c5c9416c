import { describe, expect, it } from 'vitest'
import { csvField, tracesCsv } from '../../../app/utils/results/csvExport'
import { SAFETY_NOTE } from '../../../shared/solver/safety-note'

// Field quoting follows RFC 4180, "Common Format and MIME Type for CSV Files", §2 rules 6–7.
describe('CSV of plotted traces', () => {
  it('quotes fields holding commas or quotes, doubling the quotes (RFC 4180 §2)', () => {
    expect(csvField('S21')).toBe('S21')
    expect(csvField('a, b')).toBe('"a, b"')
    expect(csvField('say "hi"')).toBe('"say ""hi"""')
  })

  it('writes the caution, a header with units, and one row per frequency that reads back exactly', () => {
    const f = [1e9, 2.45e9]
    const db = new Float64Array([-3.0102999566398125, -20])
    const vswr = [1.5, Number.POSITIVE_INFINITY]
    const text = tracesCsv(f, [{ label: 'S21', unit: 'dB', values: db }, { label: 'S11', unit: '', values: vswr }, { label: '∠S21 − ∠S31', unit: 'deg', values: [null, -90] }])
    const lines = text.split('\r\n')
    expect(lines[0]).toBe(`# ${SAFETY_NOTE}`)
    expect(lines[1]).toBe('Frequency (Hz),S21 (dB),S11,∠S21 − ∠S31 (deg)')
    expect(lines[2]).toBe('1000000000,-3.0102999566398125,1.5,')
    // A value that is not finite is left empty rather than written as "Infinity".
    expect(lines[3]).toBe('2450000000,-20,,-90')
    expect(Number(lines[2]!.split(',')[1])).toBe(db[0])
    expect(lines[4]).toBe('')
    expect(lines).toHaveLength(5)
  })
})
