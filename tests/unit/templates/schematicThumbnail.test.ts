import { describe, expect, it } from 'vitest'
import { schematicThumbnail } from '../../../app/utils/templates/schematicThumbnail'
import { TEMPLATES } from '../../../shared/templates/index'

// Geometry derived by hand from the editor's catalogue: a port is 2×2 grid steps (20 px) with its
// terminal at the right middle; a line is 4×2 with terminals at the left and right middles.
describe('schematicThumbnail', () => {
  it('places blocks and draws a wire as an elbow between terminal points', () => {
    const thumb = schematicThumbnail({
      blocks: [
        { id: 'Pa', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
        { id: 'Ka', type: 'line', params: { impedance: 50, degrees: 90, at: 1e9 }, layout: { x: 100, y: 40 } },
      ],
      wires: [['Pa.1', 'Ka.1']],
    })
    expect(thumb.blocks.map(b => [b.id, b.shape, b.x, b.y, b.width, b.height])).toEqual([['Pa', 'tag', 0, 0, 40, 40], ['Ka', 'ribbon', 100, 40, 80, 40]])
    expect(thumb.wires).toEqual(['M40 20H70V60H100'])
    expect(thumb.viewBox).toBe('-20 -20 220 120')
  })

  it('turns a rotated line upright and moves its terminals with it', () => {
    const thumb = schematicThumbnail({
      blocks: [
        { id: 'Ka', type: 'line', params: { impedance: 50, degrees: 90, at: 1e9 }, layout: { x: 0, y: 0, rotation: 90 } },
        { id: 'Pa', type: 'port', params: { index: 1 }, layout: { x: 100, y: 100, flip: true } },
      ],
      wires: [['Ka.2', 'Pa.1']],
    })
    expect(thumb.blocks[0]).toMatchObject({ width: 40, height: 80, horizontal: false })
    // Quarter turn clockwise: terminal 2 (right middle, x 4 y 1) lands at the bottom middle (x 1, y 4); a flipped port's terminal is on its left.
    expect(thumb.wires).toEqual(['M20 80H60V120H100'])
  })

  it('leaves out blocks without a layout or of unknown type, and the wires that touch them', () => {
    const thumb = schematicThumbnail({
      blocks: [
        { id: 'Pa', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
        { id: 'Ka', type: 'line', params: { impedance: 50, degrees: 90, at: 1e9 } },
        { id: 'Qa', type: 'no-such-type', params: {}, layout: { x: 50, y: 0 } },
      ],
      wires: [['Pa.1', 'Ka.1'], ['Pa.1', 'Qa.1']],
    })
    expect(thumb.blocks.map(b => b.id)).toEqual(['Pa'])
    expect(thumb.wires).toEqual([])
  })

  it('draws every wire of every template', () => {
    for (const template of TEMPLATES) {
      const document = template.build()
      const thumb = schematicThumbnail(document)
      expect(thumb.blocks.length, template.slug).toBe(document.blocks.length)
      expect(thumb.wires.length, template.slug).toBe(document.wires.length)
    }
  })

  it('finds no two blocks of a template on top of each other', () => {
    for (const template of TEMPLATES) {
      const blocks = schematicThumbnail(template.build()).blocks
      for (const [i, p] of blocks.entries()) {
        for (const q of blocks.slice(i + 1)) {
          const overlap = p.x < q.x + q.width && q.x < p.x + p.width && p.y < q.y + q.height && q.y < p.y + p.height
          expect(overlap, `${template.slug}: ${p.id} and ${q.id}`).toBe(false)
        }
      }
    }
  })
})
