/**
 * Turns the document into what the canvas draws: one node per block with its
 * terminals placed for the block's orientation, one edge per wire.
 */
import type { BlockSpec, NetworkDocument } from '~~/shared/network/types'
import { GRID, kindSpec, type Side } from './blockCatalog'
import { layoutOf, parseTerminal, wireCount, wireKey, type Wire } from './documentOps'
import { orientedSize, placeTerminal, type Rotation } from './geometry'
import { routeJunctions, storedRoute } from './wireRoutes'
import { externalShape, type ExternalPorts } from './externalTerminals'

/** Ports of a data or subnetwork block when the editor knows them. */
export type ExternalPortsOf = (block: BlockSpec) => ExternalPorts | undefined

/** A terminal as the canvas draws it, in pixels within the node box. */
export interface PlacedTerminal {
  n: number
  name?: string
  x: number
  y: number
  side: Side
  /** Wires ending here; two or more draw a junction dot. */
  wires: number
}

/** What every block node receives. */
export interface BlockNodeData {
  block: BlockSpec
  /** Unrotated symbol footprint in pixels (symbols are drawn in this frame). */
  frameWidth: number
  frameHeight: number
  /** Footprint on the canvas after turning. */
  width: number
  height: number
  rotation: Rotation
  flip: boolean
  terminals: PlacedTerminal[]
  /** Plain-words problem reported for this block by the evaluator or solver. */
  problem?: string
  readOnly: boolean
  /** Other people (live co-editing) who have this block selected: outlined in their colour. */
  remote?: Array<{ initials: string, colour: string, name: string }>
}

export interface FlowNode {
  id: string
  type: string
  position: { x: number, y: number }
  data: BlockNodeData
  selected: boolean
  draggable: boolean
  connectable: boolean
  width: number
  height: number
}

export interface FlowEdge {
  id: string
  source: string
  sourceHandle: string
  target: string
  targetHandle: string
  type: string
  selected: boolean
  /** `route`: the stored orthogonal route (from tidy), drawn while it still meets both terminals. */
  /** `dots`: where this wire parts from another of the same terminal along stored routes (junction dots). */
  data: { wire: Wire, route?: Array<[number, number]>, dots?: Array<[number, number]> }
}

/** Terminals of a block whose kind the editor cannot draw: as many as its wires mention, down its left side. */
function genericTerminals(block: BlockSpec, doc: NetworkDocument) {
  let max = 1
  for (const w of doc.wires) for (const end of w) {
    const t = parseTerminal(end)
    if (t && t.block === block.id) max = Math.max(max, t.n)
  }
  return Array.from({ length: max }, (_, i) => ({ n: i + 1, name: undefined as string | undefined, x: 0, y: i + 1, side: 'left' as Side }))
}

/** Build the canvas node for one block. */
export function blockNode(
  block: BlockSpec, order: number, doc: NetworkDocument,
  ctx: { counts: Map<string, number>, selected: ReadonlySet<string>, problems: Record<string, string>, readOnly: boolean, position?: { x: number, y: number }, external?: ExternalPortsOf },
): FlowNode {
  const ports = ctx.external?.(block)
  // Data files and sub-networks: as many terminals as the file or inner network has ports, once known.
  const spec = ports ? externalShape(ports) : kindSpec(block.type)
  const layout = layoutOf(block, order)
  const terminals = spec?.terminals ?? genericTerminals(block, doc)
  const w = spec?.width ?? 4
  const h = spec?.height ?? terminals.length + 1
  const size = orientedSize(w, h, layout.rotation)
  return {
    id: block.id,
    type: spec && !ports ? block.type : 'generic',
    position: ctx.position ?? { x: layout.x, y: layout.y },
    selected: ctx.selected.has(block.id),
    draggable: !ctx.readOnly,
    connectable: !ctx.readOnly,
    width: size.width * GRID,
    height: size.height * GRID,
    data: {
      block,
      frameWidth: w * GRID,
      frameHeight: h * GRID,
      width: size.width * GRID,
      height: size.height * GRID,
      rotation: layout.rotation,
      flip: layout.flip,
      terminals: terminals.map((t) => {
        const p = placeTerminal(t, w, h, layout)
        return { n: t.n, name: t.name, x: p.x * GRID, y: p.y * GRID, side: p.side, wires: ctx.counts.get(`${block.id}.${t.n}`) ?? 0 }
      }),
      problem: ctx.problems[block.id],
      readOnly: ctx.readOnly,
    },
  }
}

/** Build every node; `dragging` overrides positions of blocks being dragged (not yet committed to the document). */
export function documentNodes(
  doc: NetworkDocument,
  opts: { selected: ReadonlySet<string>, problems: Record<string, string>, readOnly: boolean, dragging?: Record<string, { x: number, y: number }>, external?: ExternalPortsOf },
): FlowNode[] {
  const counts = wireCount(doc)
  return doc.blocks.map((b, i) => blockNode(b, i, doc, { ...opts, counts, position: opts.dragging?.[b.id] }))
}

/** Build one edge per wire. */
export function documentEdges(doc: NetworkDocument, selected: ReadonlySet<string>): FlowEdge[] {
  const edges: FlowEdge[] = []
  for (const w of doc.wires as Wire[]) {
    const a = parseTerminal(w[0])
    const b = parseTerminal(w[1])
    if (!a || !b) continue
    const id = wireKey(w)
    edges.push({
      id, source: a.block, sourceHandle: String(a.n), target: b.block, targetHandle: String(b.n),
      type: 'wire', selected: selected.has(id), data: { wire: w, route: storedRoute(doc, id) },
    })
  }
  const routes: Record<string, Array<[number, number]>> = {}
  for (const e of edges) if (e.data.route) routes[e.id] = e.data.route
  if (Object.keys(routes).length) {
    for (const j of routeJunctions(edges.map(e => e.data.wire), routes, wireKey)) {
      const edge = edges.find(e => e.id === j.wire)
      if (edge) (edge.data.dots ??= []).push(j.at)
    }
  }
  return edges
}
