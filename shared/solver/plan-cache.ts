import type { JoinOrder } from './join-order'
import { chooseJoinOrder, type PlannedConnection } from './join-plan'

/** Inputs of `chooseJoinOrder`: the order is a pure function of them. */
export interface JoinPlanInputs {
  items: number[][]
  connections: PlannedConnection[]
  socketCount: number
  order?: JoinOrder
  seed?: number
}

/**
 * Join orders remembered across prepares, keyed by everything the order depends on, so a
 * parameter edit that keeps the join structure skips the search. Keep one per editor session.
 */
export class JoinPlanCache {
  private readonly orders = new Map<string, number[]>()

  constructor(private readonly capacity = 32) {}

  /** The order remembered for this key, if any; marks it recently used. */
  get(key: string): number[] | undefined {
    const order = this.orders.get(key)
    if (order) {
      this.orders.delete(key)
      this.orders.set(key, order)
    }
    return order
  }

  /** Remembers an order, forgetting the least recently used one beyond capacity. */
  set(key: string, order: number[]): void {
    this.orders.set(key, order)
    if (this.orders.size > this.capacity) this.orders.delete(this.orders.keys().next().value!)
  }
}

/** Everything `chooseJoinOrder` reads, as one string; equal keys give equal orders. */
export function joinPlanKey(inputs: JoinPlanInputs): string {
  const items = inputs.items.map(sockets => sockets.join(',')).join(';')
  const connections = inputs.connections.map(c => `${c.a}-${c.b}`).join(',')
  return `${inputs.order ?? 'auto'}|${inputs.seed ?? 1}|${inputs.socketCount}|${items}|${connections}`
}

/** The join order for these inputs: from the cache when it has them, else chosen (and remembered). */
export function planJoinOrder(inputs: JoinPlanInputs, cache?: JoinPlanCache): { order: number[]; reused: boolean } {
  const key = cache && joinPlanKey(inputs)
  const remembered = key === undefined ? undefined : cache!.get(key)
  if (remembered) return { order: remembered, reused: true }
  const order = chooseJoinOrder(inputs.items, inputs.connections, inputs.socketCount, inputs.order, inputs.seed)
  if (key !== undefined) cache!.set(key, order)
  return { order, reused: false }
}
