import { describe, expect, it } from 'vitest'
import { countCrossings, polylineOfPath, segmentsCross } from '~~/app/utils/editor/wireCrossings'

describe('wire crossings', () => {
  it('reads the corners of a path of straight runs', () => {
    expect(polylineOfPath('M0,0 L10,0 L10 20')).toEqual([[0, 0], [10, 0], [10, 20]])
    expect(polylineOfPath('M 5 5 H 30 V -10')).toEqual([[5, 5], [30, 5], [30, -10]])
  })

  it('counts a plus sign as one crossing and a T or a shared end as none', () => {
    // derived by hand: the runs (0,5)–(10,5) and (5,0)–(5,10) meet at (5,5), inside both.
    expect(segmentsCross([0, 5], [10, 5], [5, 0], [5, 10])).toBe(true)
    expect(segmentsCross([0, 5], [10, 5], [5, 5], [5, 10])).toBe(false)
    expect(segmentsCross([0, 0], [10, 0], [10, 0], [10, 10])).toBe(false)
    expect(segmentsCross([0, 0], [10, 0], [20, -5], [20, 5])).toBe(false)
  })

  it('counts every crossing between different wires, none within one wire', () => {
    const ladder = [[0, 5], [30, 5]] as const
    const snake = [[10, 0], [10, 10], [20, 10], [20, 0]] as const
    expect(countCrossings([ladder, snake])).toBe(2)
    expect(countCrossings([[[0, 0], [10, 10], [10, 0], [0, 10]]])).toBe(0)
    expect(countCrossings([ladder, [[0, 20], [30, 20]]])).toBe(0)
  })
})
