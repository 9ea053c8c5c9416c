/**
 * Feeds the canvas's nodes and wires to Vue Flow's store, doing only what
 * changed (see utils/editor/flowSync.ts): no hand-over when nothing changed,
 * data updated in place when only data changed, the whole list otherwise.
 */
import { watch, type Ref } from 'vue'
import type { Edge, Node, VueFlowStore } from '@vue-flow/core'
import type { FlowEdge, FlowNode } from '~~/app/utils/editor/flowModel'
import { edgesChanged, planNodeSync } from '~~/app/utils/editor/flowSync'

export function useFlowSync(flow: VueFlowStore, nodes: Readonly<Ref<FlowNode[]>>, edges: Readonly<Ref<FlowEdge[]>>) {
  let shownNodes: FlowNode[] | null = null
  let shownEdges: FlowEdge[] | null = null
  // Nodes first: wires are checked against the nodes they join.
  watch(nodes, (next) => {
    const plan = planNodeSync(shownNodes, next)
    if (plan.kind === 'replace') flow.setNodes(next as unknown as Node[])
    else if (plan.kind === 'data') for (const n of plan.nodes) flow.updateNodeData(n.id, n.data, { replace: true })
    shownNodes = next
  }, { immediate: true })
  watch(edges, (next) => {
    if (edgesChanged(shownEdges, next)) flow.setEdges(next as unknown as Edge[])
    shownEdges = next
  }, { immediate: true })
}
