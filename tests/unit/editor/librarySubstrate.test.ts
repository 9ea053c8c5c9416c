import { describe, expect, it } from 'vitest'
import { addBlock, connect } from '../../../app/utils/editor/documentOps'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import { copyLibrarySubstrate, librarySubstrateKey, librarySubstrateValues } from '../../../app/utils/editor/librarySubstrate'
import { createLibrarySubstrateSchema, updateLibrarySubstrateSchema, type LibrarySubstrateDto } from '../../../shared/schemas/substrate-library'
import { prepareNetwork, solveNetwork } from '../../../shared/solver/index'

// Pozar, Microwave Engineering, 4th ed., Example 3.7 [memory]: εr = 2.20, h = 0.127 cm; a 50 Ω strip is
// W ≈ 0.391 cm wide and 90° at 2.5 GHz is l ≈ 2.19 cm. The board's name is our own.
const board: LibrarySubstrateDto = {
  id: '00000000-0000-4000-8000-000000000001', name: 'Quillmere QL-220 1.27 mm', permittivity: 2.2, height: 1.27e-3,
  thickness: 0, lossTangent: 0, conductivity: null, roughness: 0, note: '', updatedAt: '2026-01-01T00:00:00.000Z',
}

describe('substrates from the project library', () => {
  it('are written with units and without the keys that mean "none"', () => {
    expect(librarySubstrateValues(board)).toEqual({ permittivity: 2.2, height: '1.27 mm' })
    expect(librarySubstrateValues({ ...board, thickness: 35e-6, lossTangent: 0.0027, conductivity: 5.8e7, roughness: 0.8e-6 }))
      .toEqual({ permittivity: 2.2, height: '1.27 mm', thickness: '35 um', lossTangent: 0.0027, conductivity: 5.8e7, roughness: '0.8 um' })
  })

  it('take a document name made of the board\'s name, numbered when taken', () => {
    const doc = emptyDocument('t')
    expect(librarySubstrateKey(doc, board.name)).toBe('Quillmere_QL-220_1_27_mm')
    expect(copyLibrarySubstrate(doc, board)).toBe('Quillmere_QL-220_1_27_mm')
    expect(copyLibrarySubstrate(doc, board)).toBe('Quillmere_QL-220_1_27_mm_2')
    expect(librarySubstrateKey(doc, '3.5 thin')).toBe('board_3_5_thin')
    expect(librarySubstrateKey(doc, '×'.repeat(200))).toMatch(/^board_/)
  })

  it('solve as the board: Pozar\'s Example 3.7 strip is about 50 Ω and 90° at 2.5 GHz', () => {
    const doc = emptyDocument('t')
    const name = copyLibrarySubstrate(doc, board)
    const p1 = addBlock(doc, 'port', { x: 0, y: 0 })
    const p2 = addBlock(doc, 'port', { x: 200, y: 0 })
    const ms = addBlock(doc, 'microstrip', { x: 100, y: 0 })
    connect(doc, `${p1}.1`, `${ms}.1`)
    connect(doc, `${ms}.2`, `${p2}.1`)
    Object.assign(doc.blocks.find(b => b.id === ms)!.params, { substrate: name, width: '3.91 mm', length: '2.19 cm' })
    const prepared = prepareNetwork(doc)
    if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
    const solved = solveNetwork(prepared.network, Float64Array.of(2.5e9))
    if (!solved.ok) throw new Error('did not solve')
    const { re, im } = solved.result
    expect(Math.hypot(re[0]!, im[0]!)).toBeLessThan(0.02)
    // Within 2° of −90°: dispersion at 2.5 GHz on 1.27 mm and the rounded figures of the example.
    expect(Math.abs((Math.atan2(im[2]!, re[2]!) * 180) / Math.PI + 90)).toBeLessThan(2)
  })

  it('the API schema takes SI numbers within bounds and says which field is wrong', () => {
    expect(createLibrarySubstrateSchema.parse({ name: ' QL ', permittivity: 3.5, height: 5e-4 })).toMatchObject({ name: 'QL', thickness: 0, conductivity: null, note: '' })
    const bad = createLibrarySubstrateSchema.safeParse({ name: 'x', permittivity: 0.5, height: 1 })
    expect(bad.success).toBe(false)
    expect(bad.error!.issues.map(i => i.message)).toEqual(['Relative permittivity must be at least 1.', 'Height must be at most 0.1 m (100 mm).'])
    expect(createLibrarySubstrateSchema.safeParse({ name: 'x', permittivity: 3, height: 1e-3, extra: 1 }).success).toBe(false)
    expect(updateLibrarySubstrateSchema.safeParse({}).success).toBe(false)
    expect(updateLibrarySubstrateSchema.parse({ conductivity: null })).toEqual({ conductivity: null })
  })
})
