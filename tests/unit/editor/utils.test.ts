import { describe, expect, it } from 'vitest'
import { formatDb, formatDegrees, formatFrequency, formatSI, formatTick } from '../../../app/utils/editor/format'
import { readParamInput } from '../../../app/utils/editor/paramInput'
import { importDocument } from '../../../app/utils/editor/importDocument'
import { applySelectionChanges } from '../../../app/utils/editor/selection'
import { gammaToZ, reactanceArcEnd, resistanceCircle } from '../../../app/utils/editor/smith'
import { documentEdges, documentNodes } from '../../../app/utils/editor/flowModel'
import { lumpedParts } from '../../../app/utils/editor/lumped'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import { addBlock, connect } from '../../../app/utils/editor/documentOps'
import { freeSpot } from '../../../app/utils/editor/placement'

describe('readouts', () => {
  it('formats with SI prefixes, a true minus and units', () => {
    expect(formatFrequency(2.45e9)).toBe('2.450 GHz')
    expect(formatSI(35.3553, 'Ω')).toBe('35.36 Ω')
    expect(formatSI(1.5e-9, 's')).toBe('1.500 ns')
    expect(formatDb(-3.0103)).toBe('−3.01 dB')
    expect(formatDegrees(-90)).toBe('−90.0°')
  })
})

describe('parameter fields', () => {
  it('keeps plain numbers as numbers and everything else as expressions', () => {
    expect(readParamInput(' 50 ')).toBe(50)
    expect(readParamInput('1e9')).toBe(1e9)
    expect(readParamInput('Z0/sqrt(2)')).toBe('Z0/sqrt(2)')
    expect(readParamInput('2.45 GHz')).toBe('2.45 GHz')
    expect(readParamInput('  ')).toBeUndefined()
  })
})

describe('JSON import', () => {
  it('accepts a valid document and lists every problem of a bad one', () => {
    expect(importDocument(JSON.stringify(emptyDocument('x'))).ok).toBe(true)
    const bad = importDocument(JSON.stringify({ format: 'portwright.network', version: 1, blocks: [{ id: 'A', type: 'line', params: { impedance: true } }] }))
    expect(bad.ok).toBe(false)
    if (!bad.ok) {
      expect(bad.problems.some(p => p.block === 'A')).toBe(true)
      expect(bad.problems.some(p => p.message.includes('wires'))).toBe(true)
    }
    const notJson = importDocument('{ nope')
    expect(notJson.ok).toBe(false)
  })
})

describe('selection changes', () => {
  it('adds and removes ids and ignores batches without selection', () => {
    expect(applySelectionChanges(['A'], [{ type: 'select', id: 'B', selected: true }, { type: 'select', id: 'A', selected: false }])).toEqual(['B'])
    expect(applySelectionChanges(['A'], [{ type: 'position', id: 'A' }])).toBeNull()
  })
})

describe('Smith chart grid', () => {
  it('puts r = 1 through the centre and x = ±1 ends at Γ = ±j', () => {
    expect(resistanceCircle(1)).toEqual({ cx: 0.5, cy: 0, r: 0.5 })
    expect(reactanceArcEnd(1)).toEqual({ x: 0, y: 1 })
    expect(reactanceArcEnd(-1)).toEqual({ x: 0, y: -1 })
    const z = gammaToZ(0, 1)
    expect(z.r).toBeCloseTo(0, 12)
    expect(z.x).toBeCloseTo(1, 12)
  })
})

describe('canvas model', () => {
  it('draws one node per block, one edge per wire, and a junction where wires meet', () => {
    const doc = emptyDocument('x')
    addBlock(doc, 'port', { x: 0, y: 0 })
    addBlock(doc, 'line', { x: 100, y: 0 })
    addBlock(doc, 'stub', { x: 100, y: 100 })
    connect(doc, 'P1.1', 'LN1.1')
    connect(doc, 'P1.1', 'ST1.1')
    const nodes = documentNodes(doc, { selected: new Set(['LN1']), problems: { ST1: 'bad' }, readOnly: false })
    expect(nodes.map(n => [n.id, n.type, n.selected])).toEqual([['P1', 'port', false], ['LN1', 'line', true], ['ST1', 'stub', false]])
    expect(nodes[0]!.data.terminals[0]!.wires).toBe(2)
    expect(nodes[2]!.data.problem).toBe('bad')
    expect(documentEdges(doc, new Set()).map(e => [e.source, e.sourceHandle, e.target, e.targetHandle])).toEqual([['P1', '1', 'LN1', '1'], ['P1', '1', 'ST1', '1']])
  })

  it('shows the IEC parts a load holds', () => {
    expect(lumpedParts({ resistance: 50 })).toEqual(['R'])
    expect(lumpedParts({ resistance: 10, inductance: '1 nH', capacitance: '1 pF' })).toEqual(['R', 'L', 'C'])
    expect(lumpedParts({ end: 'open' })).toEqual(['open'])
    expect(lumpedParts({})).toEqual(['short'])
  })

  it('places new blocks where nothing else is', () => {
    const doc = emptyDocument('x')
    addBlock(doc, 'line', { x: 0, y: 0 })
    const spot = freeSpot(doc, { x: 0, y: 0 })
    expect(spot).not.toEqual({ x: 0, y: 0 })
    expect(freeSpot(emptyDocument('y'), { x: 40, y: 60 })).toEqual({ x: 40, y: 60 })
  })
})

describe('axis ticks', () => {
  it('writes dB and degrees as plain numbers with the decimals the spacing needs, other units with SI prefixes', () => {
    // Engineers read "−0.50 dB", never "−500 mdB" (common practice).
    expect(formatTick(-0.5, 'dB', 0.5)).toBe('\u22120.5 dB')
    expect(formatTick(-0.25, 'dB', 0.25)).toBe('\u22120.25 dB')
    expect(formatTick(-80, 'dB', 20)).toBe('\u221280 dB')
    expect(formatTick(-0, 'dB', 10)).toBe('0 dB')
    expect(formatTick(90, '°', 30)).toBe('90°')
    expect(formatTick(1.5, '', 0.5)).toBe('1.5')
    expect(formatTick(2.4e9, 'Hz', 2e8)).toBe('2.40 GHz')
    expect(formatTick(1.5e-9, 's', 5e-10)).toBe('1.50 ns')
  })
})
