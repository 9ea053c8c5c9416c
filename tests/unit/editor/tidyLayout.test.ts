import ELK from 'elkjs/lib/elk.bundled.js'
import { describe, expect, it } from 'vitest'
import { applyTidy, reattachRoute, tidyLayout } from '~~/app/utils/editor/tidyLayout'
import { storedRoute } from '~~/app/utils/editor/wireRoutes'
import { countCrossings } from '~~/app/utils/editor/wireCrossings'
import { documentNodes } from '~~/app/utils/editor/flowModel'
import { EXAMPLES } from '~~/shared/examples/index'

const elk = new ELK()
const copy = <T>(v: T): T => JSON.parse(JSON.stringify(v))

/** Terminal positions on the canvas after a layout: block position plus the terminal's place in its box. */
function terminalsOf(doc: Parameters<typeof documentNodes>[0]) {
  const at = new Map<string, [number, number]>()
  for (const n of documentNodes(doc, { selected: new Set(), problems: {}, readOnly: true })) {
    for (const t of n.data.terminals) at.set(`${n.id}.${t.n}`, [n.position.x + t.x, n.position.y + t.y])
  }
  return at
}

describe('tidy', () => {
  it('lays the branch-line hybrid out on the grid with orthogonal routes that meet their terminals and never cross', async () => {
    const doc = copy(EXAMPLES['branch-line-hybrid']!)
    const result = await tidyLayout(doc, elk)
    for (const p of Object.values(result.positions)) expect([p.x % 20, p.y % 20]).toEqual([0, 0])
    applyTidy(doc, result)
    const at = terminalsOf(doc)
    for (const w of doc.wires) {
      const route = storedRoute(doc, w[0] < w[1] ? `${w[0]}~${w[1]}` : `${w[1]}~${w[0]}`)!
      expect(route).toBeDefined()
      expect(route[0]).toEqual(at.get(w[0]))
      expect(route[route.length - 1]).toEqual(at.get(w[1]))
      for (let i = 0; i + 1 < route.length; i++) expect(route[i]![0] === route[i + 1]![0] || route[i]![1] === route[i + 1]![1]).toBe(true)
    }
    expect(countCrossings(Object.values(result.routes))).toBe(0)
  })

  it('places every block and routes every wire of each example', async () => {
    for (const [name, doc] of Object.entries(EXAMPLES)) {
      if (doc.blocks.length > 60) continue
      const result = await tidyLayout(copy(doc), elk)
      expect(Object.keys(result.positions).sort(), name).toEqual(doc.blocks.map(b => b.id).sort())
      expect(Object.keys(result.routes).length, name).toBe(doc.wires.length)
    }
  })

  it('keeps a route orthogonal when its ends move onto the grid', () => {
    expect(reattachRoute([[0, 3], [50, 3], [50, 97], [100, 97]], [0, 0], [100, 100])).toEqual([[0, 0], [50, 0], [50, 100], [100, 100]])
    expect(reattachRoute([[0, 3], [100, 3]], [0, 0], [100, 10])).toEqual([[0, 0], [50, 0], [50, 10], [100, 10]])
  })
})
