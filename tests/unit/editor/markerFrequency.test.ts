import { describe, expect, it } from 'vitest'
import { readMarkerFrequency } from '../../../app/utils/editor/markerFrequency'
import { formatFrequency } from '../../../app/utils/editor/format'

// A 201-point sweep from 1.45 GHz to 3.45 GHz (10 MHz steps), as in the editor's browser test.
const sweep = Float64Array.from({ length: 201 }, (_, k) => 1.45e9 + k * 1e7)

describe('marker frequency field', () => {
  it('reads a typed frequency, snaps it to the sweep and shows it formatted', () => {
    expect(readMarkerFrequency('2.45 GHz', sweep)).toEqual({ ok: true, index: 100, frequency: 2.45e9, text: '2.450 GHz' })
    expect(readMarkerFrequency(' 2450 MHz ', sweep)).toMatchObject({ ok: true, index: 100, text: '2.450 GHz' })
    expect(readMarkerFrequency('2.4537e9', sweep)).toMatchObject({ ok: true, frequency: 2.45e9 })
  })

  it('reads back its own formatted text unchanged', () => {
    const shown = formatFrequency(sweep[37]!)
    expect(shown).toBe('1.820 GHz')
    expect(readMarkerFrequency(shown, sweep)).toMatchObject({ ok: true, index: 37, text: shown })
  })

  it('refuses text with a stray character after the unit instead of guessing', () => {
    const outcome = readMarkerFrequency('2.450 GHz0', sweep)
    expect(outcome.ok).toBe(false)
    if (!outcome.ok) expect(outcome.error).toContain('GHz0')
  })

  it('puts a frequency outside the sweep on its nearest end', () => {
    expect(readMarkerFrequency('100 MHz', sweep)).toMatchObject({ ok: true, index: 0, text: '1.450 GHz' })
    expect(readMarkerFrequency('9 GHz', sweep)).toMatchObject({ ok: true, index: 200, text: '3.450 GHz' })
  })

  it('asks for a frequency when the field is empty or there is no sweep', () => {
    expect(readMarkerFrequency('  ', sweep).ok).toBe(false)
    expect(readMarkerFrequency('2.45 GHz', new Float64Array(0)).ok).toBe(false)
  })
})
