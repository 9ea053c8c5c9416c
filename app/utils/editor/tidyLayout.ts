/**
 * Tidy: lays the network out left to right with ELK's layered algorithm
 * (terminals fixed where each symbol has them, wires routed orthogonally
 * around blocks). The result is block positions on the grid and one route
 * per wire, stored in the document under `view.routes` (our own key).
 */
import type { NetworkDocument } from '~~/shared/network/types'
import { GRID } from './blockCatalog'
import { parseTerminal, wireKey, type Wire } from './documentOps'
import { documentNodes } from './flowModel'
import { snap } from './geometry'
import type { Point } from './wireCrossings'

import type { WireRoutes } from './wireRoutes'

export type { WireRoutes } from './wireRoutes'

export interface TidyResult {
  positions: Record<string, { x: number, y: number }>
  routes: WireRoutes
}

interface ElkPoint { x: number, y: number }
interface ElkSection { startPoint: ElkPoint, endPoint: ElkPoint, bendPoints?: ElkPoint[] }
interface ElkNode { id: string, x?: number, y?: number, width: number, height: number, children?: ElkNode[], ports?: unknown[], edges?: Array<{ id: string, sections?: ElkSection[] }>, layoutOptions?: Record<string, string> }
/** The part of ELK's API we use (elkjs, worker-less). */
export interface ElkLike { layout: (graph: any) => Promise<any> }

const SIDES = { left: 'WEST', right: 'EAST', top: 'NORTH', bottom: 'SOUTH' } as const

/** The ELK graph of a document: blocks with their terminals as fixed ports, wires as edges. */
export function elkGraphOf(doc: NetworkDocument): { graph: ElkNode, wires: Wire[] } {
  const nodes = documentNodes(doc, { selected: new Set(), problems: {}, readOnly: true })
  const ports = new Set<string>()
  const children = nodes.map(n => ({
    id: n.id,
    width: n.width,
    height: n.height,
    layoutOptions: { 'elk.portConstraints': 'FIXED_POS' },
    ports: n.data.terminals.map((t) => {
      ports.add(`${n.id}.${t.n}`)
      return { id: `${n.id}.${t.n}`, x: t.x, y: t.y, width: 0, height: 0, layoutOptions: { 'elk.port.side': SIDES[t.side] } }
    }),
  }))
  const wires = (doc.wires as Wire[]).filter(w => w[0] !== w[1] && ports.has(w[0]) && ports.has(w[1]) && parseTerminal(w[0]) && parseTerminal(w[1]))
  const graph: ElkNode = {
    id: 'network',
    width: 0,
    height: 0,
    layoutOptions: {
      'elk.algorithm': 'layered',
      'elk.direction': 'RIGHT',
      'elk.edgeRouting': 'ORTHOGONAL',
      'elk.spacing.nodeNode': String(2 * GRID),
      'elk.layered.spacing.nodeNodeBetweenLayers': String(3 * GRID),
      'elk.spacing.edgeNode': String(GRID),
      'elk.spacing.edgeEdge': String(GRID / 2),
      'elk.layered.spacing.edgeNodeBetweenLayers': String(GRID),
      'elk.layered.crossingMinimization.strategy': 'LAYER_SWEEP',
      'elk.layered.thoroughness': '20',
      'elk.separateConnectedComponents': 'true',
    },
    children,
    edges: wires.map((w, i) => ({ id: `w${i}`, sources: [w[0]], targets: [w[1]] })) as any,
  }
  return { graph, wires }
}

/** Keeps a route orthogonal after its two ends moved (by snapping) to `start` and `end`. */
export function reattachRoute(route: Point[], start: Point, end: Point): Array<[number, number]> {
  const out = route.map(p => [p[0], p[1]] as [number, number])
  if (out.length < 2) return [[start[0], start[1]], [end[0], end[1]]]
  const first = out[0]!
  const last = out[out.length - 1]!
  if (out.length === 2) {
    // A straight run whose ends no longer line up gets a jog half way.
    if (start[0] === end[0] || start[1] === end[1]) return [[start[0], start[1]], [end[0], end[1]]]
    const horizontal = first[1] === last[1]
    if (horizontal) {
      const midX = snap((start[0] + end[0]) / 2, GRID / 2)
      return [[start[0], start[1]], [midX, start[1]], [midX, end[1]], [end[0], end[1]]]
    }
    const midY = snap((start[1] + end[1]) / 2, GRID / 2)
    return [[start[0], start[1]], [start[0], midY], [end[0], midY], [end[0], end[1]]]
  }
  const second = out[1]!
  const beforeLast = out[out.length - 2]!
  if (first[1] === second[1]) second[1] = start[1]
  else second[0] = start[0]
  if (last[1] === beforeLast[1]) beforeLast[1] = end[1]
  else beforeLast[0] = end[0]
  out[0] = [start[0], start[1]]
  out[out.length - 1] = [end[0], end[1]]
  return out
}

/** Reads ELK's answer: block positions snapped to the grid, and routes re-attached to the snapped terminals. */
export function tidyFromElk(doc: NetworkDocument, laidOut: ElkNode, wires: Wire[]): TidyResult {
  const positions: TidyResult['positions'] = {}
  const offsets: Record<string, { dx: number, dy: number }> = {}
  for (const child of laidOut.children ?? []) {
    const x = snap(child.x ?? 0, GRID)
    const y = snap(child.y ?? 0, GRID)
    positions[child.id] = { x, y }
    offsets[child.id] = { dx: x - (child.x ?? 0), dy: y - (child.y ?? 0) }
  }
  const routes: WireRoutes = {}
  const edges = laidOut.edges ?? []
  wires.forEach((w, i) => {
    const section = edges.find(e => e.id === `w${i}`)?.sections?.[0]
    if (!section) return
    const a = offsets[parseTerminal(w[0])!.block] ?? { dx: 0, dy: 0 }
    const b = offsets[parseTerminal(w[1])!.block] ?? { dx: 0, dy: 0 }
    const raw: Point[] = [section.startPoint, ...(section.bendPoints ?? []), section.endPoint].map(p => [p.x, p.y])
    const start: Point = [section.startPoint.x + a.dx, section.startPoint.y + a.dy]
    const end: Point = [section.endPoint.x + b.dx, section.endPoint.y + b.dy]
    routes[wireKey(w)] = reattachRoute(raw, start, end).map(([x, y]) => [Math.round(x), Math.round(y)])
  })
  return { positions, routes }
}

/** Lays the document out (asynchronously; `elk` is elkjs's worker-less instance or a stand-in). */
export async function tidyLayout(doc: NetworkDocument, elk: ElkLike): Promise<TidyResult> {
  const { graph, wires } = elkGraphOf(doc)
  const laidOut = await elk.layout(graph) as ElkNode
  return tidyFromElk(doc, laidOut, wires)
}

/** Writes a tidy result into a draft document: positions, and the routes under `view.routes`. */
export function applyTidy(draft: NetworkDocument, result: TidyResult): void {
  for (const block of draft.blocks) {
    const p = result.positions[block.id]
    if (!p) continue
    block.layout = { ...(block.layout ?? {}), x: p.x, y: p.y }
  }
  const extra = draft as NetworkDocument & { view?: Record<string, unknown> }
  extra.view = { ...(extra.view ?? {}), routes: result.routes }
}
