import { describe, expect, it } from 'vitest'
import { countCrossings, polylineOfPath, segmentsCross } from '~~/app/utils/editor/wireCrossings'
import { routeJunctions } from '~~/app/utils/editor/wireRoutes'

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

describe('route junctions', () => {
  const key = (w: readonly [string, string]) => `${w[0]}~${w[1]}`
  it('marks where two wires of one terminal part ways, and nothing where they part at the terminal', () => {
    // derived by hand: both leave A.1 at (0,0) to the right together and part at (10,0).
    const wires = [['A.1', 'B.1'], ['A.1', 'C.1'], ['D.1', 'E.1']] as const
    const routes = {
      'A.1~B.1': [[0, 0], [20, 0]],
      'A.1~C.1': [[0, 0], [10, 0], [10, 10]],
      'D.1~E.1': [[0, 0], [0, -10]],
    } as Record<string, Array<[number, number]>>
    expect(routeJunctions(wires as any, routes, key)).toEqual([{ at: [10, 0], wire: 'A.1~B.1' }])
    expect(routeJunctions([wires[0], wires[2]] as any, routes, key)).toEqual([])
  })
})
