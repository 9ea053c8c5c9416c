import type { BlockSpec, NetworkDocument, Wire } from '../network/types'

/**
 * A cascade of `sections` 30° line sections alternating between 40 Ω and 60 Ω between two
 * 50 Ω ports: every joint is an impedance step, so it exercises renormalising joins.
 */
export function lineChain(sections: number): NetworkDocument {
  const perRow = 10
  const blocks: BlockSpec[] = [{ id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } }]
  const wires: Wire[] = []
  let previous = 'P1.1'
  for (let s = 1; s <= sections; s++) {
    const row = Math.floor((s - 1) / perRow)
    blocks.push({
      id: `L${s}`,
      type: 'line',
      params: { impedance: s % 2 ? 'Zlow' : 'Zhigh', degrees: 30, at: 'f0' },
      layout: { x: 160 * (((s - 1) % perRow) + 1), y: 120 * row },
    })
    wires.push([previous, `L${s}.1`])
    previous = `L${s}.2`
  }
  blocks.push({ id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 160 * (perRow + 1), y: 120 * Math.floor((sections - 1) / perRow), flip: true } })
  wires.push([previous, 'P2.1'])
  return {
    format: 'portwright.network',
    version: 1,
    name: `Chain of ${sections} line sections`,
    referenceImpedance: 50,
    variables: { f0: '2.45 GHz', Zlow: '40 ohm', Zhigh: '60 ohm' },
    sweep: { start: '1 GHz', stop: '4 GHz', points: 1001, spacing: 'linear' },
    blocks,
    wires,
  }
}
