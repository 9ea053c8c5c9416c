import { describe, expect, it } from 'vitest'
import { documentEdges, documentNodes, type FlowNode } from '../../../app/utils/editor/flowModel'
import { edgesChanged, planNodeSync } from '../../../app/utils/editor/flowSync'
import { emptyDocument } from '../../../app/utils/editor/emptyDocument'
import { addBlock, connect } from '../../../app/utils/editor/documentOps'

function network() {
  const doc = emptyDocument('sync')
  const p1 = addBlock(doc, 'port', { x: 0, y: 0 })!
  const tl = addBlock(doc, 'line', { x: 100, y: 0 })!
  const p2 = addBlock(doc, 'port', { x: 200, y: 0 })!
  connect(doc, `${p1}.1`, `${tl}.1`)
  connect(doc, `${tl}.2`, `${p2}.1`)
  return { doc, tl }
}
const opts = { selected: new Set<string>(), problems: {}, readOnly: false }

describe('handing canvas nodes to Vue Flow', () => {
  it('hands the whole list over the first time and when blocks come or go', () => {
    const { doc } = network()
    const nodes = documentNodes(doc, opts)
    expect(planNodeSync(null, nodes)).toEqual({ kind: 'replace' })
    expect(planNodeSync(nodes, nodes.slice(1))).toEqual({ kind: 'replace' })
  })

  it('does nothing when every node is the same object', () => {
    const { doc } = network()
    const nodes = documentNodes(doc, opts)
    expect(planNodeSync(nodes, [...nodes])).toEqual({ kind: 'none' })
  })

  it('updates only the data of a node whose parameters changed', () => {
    const { doc, tl } = network()
    const before = documentNodes(doc, opts)
    const edited: FlowNode[] = before.map(n => (n.id === tl ? { ...n, data: { ...n.data, block: { ...n.data.block, params: { impedance: 40 } } } } : n))
    const plan = planNodeSync(before, edited)
    expect(plan.kind).toBe('data')
    if (plan.kind === 'data') expect(plan.nodes.map(n => n.id)).toEqual([tl])
  })

  it('hands the list over when a node moves, is selected or is turned', () => {
    const { doc, tl } = network()
    const before = documentNodes(doc, opts)
    const moved = before.map(n => (n.id === tl ? { ...n, position: { x: n.position.x + 20, y: n.position.y } } : n))
    const selected = documentNodes(doc, { ...opts, selected: new Set([tl]) }).map((n, k) => (n.id === tl ? n : before[k]!))
    const turned = before.map(n => (n.id === tl ? { ...n, width: n.height, height: n.width } : n))
    expect(planNodeSync(before, moved)).toEqual({ kind: 'replace' })
    expect(planNodeSync(before, selected)).toEqual({ kind: 'replace' })
    expect(planNodeSync(before, turned)).toEqual({ kind: 'replace' })
  })

  it('hands wires over only when one of them is a different object', () => {
    const { doc } = network()
    const edges = documentEdges(doc, new Set())
    expect(edgesChanged(null, edges)).toBe(true)
    expect(edgesChanged(edges, [...edges])).toBe(false)
    expect(edgesChanged(edges, documentEdges(doc, new Set()))).toBe(true)
    expect(edgesChanged(edges, edges.slice(1))).toBe(true)
  })
})
