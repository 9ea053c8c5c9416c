/**
 * How to hand a new list of canvas nodes or wires to Vue Flow with the least
 * work. Replacing Vue Flow's node list makes it rebuild its lookup of nodes,
 * and every wire re-renders with it; a parameter edit (a slider) changes only
 * the data of one node, which can be updated in place.
 */
import type { FlowEdge, FlowNode } from './flowModel'

export type NodeSyncPlan =
  | { kind: 'none' }
  | { kind: 'replace' }
  | { kind: 'data', nodes: FlowNode[] }

/** Everything about a node except its data: when any of it differs, the whole list is handed over. */
function sameFrame(a: FlowNode, b: FlowNode): boolean {
  return a.id === b.id && a.type === b.type && a.position.x === b.position.x && a.position.y === b.position.y
    && a.selected === b.selected && a.draggable === b.draggable && a.connectable === b.connectable
    && a.width === b.width && a.height === b.height
}

/** Compare the nodes Vue Flow has (`shown`, null before the first hand-over) with the next ones. */
export function planNodeSync(shown: readonly FlowNode[] | null, next: readonly FlowNode[]): NodeSyncPlan {
  if (!shown || shown.length !== next.length) return { kind: 'replace' }
  const changed: FlowNode[] = []
  for (let k = 0; k < next.length; k++) {
    const a = shown[k]!
    const b = next[k]!
    if (a === b) continue
    if (!sameFrame(a, b)) return { kind: 'replace' }
    if (a.data !== b.data) changed.push(b)
  }
  return changed.length ? { kind: 'data', nodes: changed } : { kind: 'none' }
}

/** Wires are handed over whole, and only when one of them is a different object. */
export function edgesChanged(shown: readonly FlowEdge[] | null, next: readonly FlowEdge[]): boolean {
  if (!shown || shown.length !== next.length) return true
  for (let k = 0; k < next.length; k++) if (shown[k] !== next[k]) return true
  return false
}
