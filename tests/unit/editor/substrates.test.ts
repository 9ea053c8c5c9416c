import { describe, expect, it } from 'vitest'
import { addBlock, connect } from '../../../app/utils/editor/documentOps'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import { addSubstrate, removeSubstrate, renameSubstrate, setSubstrateValue } from '../../../app/utils/editor/substrateOps'
import { prepareNetwork, solveNetwork } from '../../../shared/solver/index'

describe('microstrip blocks placed from the rail', () => {
  it('get a substrate, so the network solves as placed', () => {
    const doc = emptyDocument('t')
    const p1 = addBlock(doc, 'port', { x: 0, y: 0 })
    const p2 = addBlock(doc, 'port', { x: 200, y: 0 })
    const ms = addBlock(doc, 'microstrip', { x: 100, y: 0 })
    expect(connect(doc, `${p1}.1`, `${ms}.1`)).toBe(true)
    expect(connect(doc, `${ms}.2`, `${p2}.1`)).toBe(true)
    expect(Object.keys(doc.substrates ?? {})).toEqual(['board'])
    expect(doc.blocks.find(b => b.id === ms)!.params.substrate).toBe('board')
    const prepared = prepareNetwork(doc)
    if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
    const solved = solveNetwork(prepared.network, Float64Array.of(1e9))
    expect(solved.ok && solved.warnings).toEqual([])
    // A second microstrip uses the existing substrate rather than adding another.
    const second = addBlock(doc, 'microstrip', { x: 100, y: 100 })
    expect(doc.blocks.find(b => b.id === second)!.params.substrate).toBe('board')
    expect(Object.keys(doc.substrates ?? {})).toEqual(['board'])
  })

  it('the open end, step and bend kinds also start with parameters the solver accepts', () => {
    const doc = emptyDocument('t')
    const p1 = addBlock(doc, 'port', { x: 0, y: 0 })
    const p2 = addBlock(doc, 'port', { x: 400, y: 0 })
    const step = addBlock(doc, 'microstripStep', { x: 100, y: 0 })
    const bend = addBlock(doc, 'microstripBend', { x: 200, y: 0 })
    const line = addBlock(doc, 'microstrip', { x: 300, y: 0 })
    const open = addBlock(doc, 'microstripOpen', { x: 300, y: 100 })
    for (const [a, b] of [[`${p1}.1`, `${step}.1`], [`${step}.2`, `${bend}.1`], [`${bend}.2`, `${line}.1`], [`${line}.2`, `${p2}.1`], [`${line}.2`, `${open}.1`]] as const) {
      expect(connect(doc, a, b)).toBe(true)
    }
    const prepared = prepareNetwork(doc)
    if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
    expect(solveNetwork(prepared.network, Float64Array.of(1e9)).ok).toBe(true)
  })
})

describe('substrate edits', () => {
  it('add, edit, rename (blocks follow) and remove', () => {
    const doc = emptyDocument('t')
    const ms = addBlock(doc, 'microstrip', { x: 0, y: 0 })
    expect(addSubstrate(doc)).toBe('board2')
    setSubstrateValue(doc, 'board', 'roughness', '1 um')
    setSubstrateValue(doc, 'board', 'lossTangent', undefined)
    setSubstrateValue(doc, 'board', 'height', undefined)
    expect(doc.substrates!.board).toMatchObject({ roughness: '1 um', height: '0.5 mm' })
    expect(doc.substrates!.board).not.toHaveProperty('lossTangent')
    expect(renameSubstrate(doc, 'board', 'board2')).toBe(false)
    expect(renameSubstrate(doc, 'board', '9 lives')).toBe(false)
    expect(renameSubstrate(doc, 'board', 'top_core')).toBe(true)
    expect(Object.keys(doc.substrates!)).toEqual(['top_core', 'board2'])
    expect(doc.blocks.find(b => b.id === ms)!.params.substrate).toBe('top_core')
    removeSubstrate(doc, 'board2')
    expect(Object.keys(doc.substrates!)).toEqual(['top_core'])
  })
})
