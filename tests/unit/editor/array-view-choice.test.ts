import { describe, expect, it } from 'vitest'
import type { NetworkDocument } from '../../../shared/network/types'
import { parsePortList, saveArrayView, savedArrayView, spacingWavelengths, type ArrayViewChoice } from '../../../app/utils/editor/arrayViewChoice'

const base = { format: 'portwright.network', version: 1, name: 'x', referenceImpedance: 50, blocks: [], wires: [] } as unknown as NetworkDocument
const choice: ArrayViewChoice = { inputs: [1, 2], outputs: [3, 4], spacing: 0.5, spacingUnit: 'wavelengths', elementExponent: 0, frequency: 2.45e9 }

describe('array view choices', () => {
  it('are saved under view.array beside the markers and read back the same', () => {
    const doc = structuredClone({ ...base, view: { markers: [{ frequency: 1e9 }] } }) as NetworkDocument
    saveArrayView(doc, choice)
    expect((doc.view as { markers: unknown }).markers).toEqual([{ frequency: 1e9 }])
    expect(savedArrayView(doc)).toEqual(choice)
  })

  it('ignore a saved value that is not what the view writes', () => {
    for (const array of [{ ...choice, inputs: 'all' }, { ...choice, spacing: -1 }, { ...choice, spacingUnit: 'feet' }, { ...choice, outputs: Array(100).fill(1) }]) {
      expect(savedArrayView({ ...base, view: { array } } as unknown as NetworkDocument)).toBeNull()
    }
  })

  it('turn a length into wavelengths: 61.2 mm at 2.45 GHz is half a wavelength', () => {
    // λ = c/f = 299 792 458 / 2.45e9 = 122.364 mm (derived by hand), so 61.18 mm is 0.5 λ.
    expect(spacingWavelengths({ spacing: 0.061182, spacingUnit: 'm' }, 2.45e9)).toBeCloseTo(0.5, 4)
  })

  it('read port lists and name what is wrong', () => {
    expect(parsePortList('1, 2 3', 8)).toEqual({ ok: true, list: [1, 2, 3] })
    expect(parsePortList('1, 9', 8)).toEqual({ ok: false, message: 'port 9 does not exist (the network has 8 ports)' })
    expect(parsePortList('1, 1', 8)).toEqual({ ok: false, message: 'port 1 is listed twice' })
    expect(parsePortList('a', 8)).toEqual({ ok: false, message: '"a" is not a port number' })
  })
})
