import { describe, expect, it } from 'vitest'
import { branchLineTuning } from '../../../shared/examples/index'
import { prepareTuning } from '../../../shared/tuning/index'

const messages = (input: unknown) => {
  const prepared = prepareTuning(input)
  return prepared.ok ? [] : prepared.problems.map(p => p.message)
}

describe('prepareTuning', () => {
  it('names a missing spec, a spec without conditions and a band that holds no sweep frequency', () => {
    expect(messages({ ...branchLineTuning(false), spec: undefined })).toEqual(['spec: the document has no spec; add one (centre, band and conditions) to judge designs against'])
    const empty = branchLineTuning(false)
    empty.spec!.conditions = []
    expect(messages(empty)).toEqual(['spec.conditions: give at least one condition to meet'])
    const narrow = branchLineTuning(false)
    // The sweep steps by 4.5 MHz from 2 GHz: 2.4501–2.4502 GHz lies between two points.
    narrow.spec!.band = { start: '2.4501 GHz', stop: '2.4502 GHz' }
    expect(messages(narrow)).toEqual(['spec.band: no frequency of the sweep lies inside the band 2.4501 GHz – 2.4502 GHz; add sweep points or widen the band'])
  })

  it('judges the band\'s sweep points, or the centre alone (added to the sweep) when there is no band', () => {
    const banded = prepareTuning(branchLineTuning(false))
    // 2.35…2.55 GHz in 4.5 MHz steps from 2 GHz: 2.3500, 2.3545, …, 2.5480 GHz (derived by hand: 45 points).
    expect(banded.ok && banded.setup.judged.length).toBe(45)
    const centred = branchLineTuning(false)
    delete centred.spec!.band
    centred.spec!.center = '2.4512 GHz'
    const prepared = prepareTuning(centred)
    expect(prepared.ok && Array.from(prepared.setup.judged)).toEqual([2.4512e9])
    expect(prepared.ok && prepared.setup.sweep.includes(2.4512e9)).toBe(true)
  })
})
