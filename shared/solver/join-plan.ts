import { JoinQueue, seededRandom, type JoinOrder } from './join-order'

/** A join to make: two sockets (item terminals) to connect. */
export interface PlannedConnection {
  a: number
  b: number
}

interface Simulation {
  order: number[]
  cost: number
}

type Score = (x: number, y: number, sizes: number[], shared: number) => number

// Final size of the joined item once every connection between the two is made.
const byFinalSize: Score = (x, y, sizes, shared) => (x === y ? sizes[x]! - 2 : sizes[x]! + sizes[y]! - 2 * shared) * 4096 + (x === y ? sizes[x]! : sizes[x]! + sizes[y]!)
// Size right after this one join.
const byNextSize: Score = (x, y, sizes) => (x === y ? sizes[x]! - 2 : sizes[x]! + sizes[y]! - 2) * 4096 + (x === y ? sizes[x]! : sizes[x]! + sizes[y]!)
// Cheapest join first, whatever it leads to.
const byWork: Score = (x, y, sizes) => (x === y ? 2 * (sizes[x]! - 2) ** 2 : (sizes[x]! + sizes[y]! - 2) ** 2)

/**
 * Simulates joining with only socket lists (no numbers) and returns the order and its
 * cost: about (size)² complex updates per join, twice that for closing a loop.
 */
function simulate(items: number[][], connections: PlannedConnection[], socketCount: number, pick: ((state: State) => number) | number[]): Simulation {
  const state = new State(items, connections, socketCount)
  const order: number[] = []
  let cost = 0
  for (let step = 0; state.remaining > 0; step++) {
    const c = Array.isArray(pick) ? pick[step]! : pick(state)
    if (state.done[c]) continue
    cost += state.join(c)
    order.push(c)
  }
  return { order, cost }
}

class State {
  readonly sockets: number[][]
  readonly sizes: number[]
  readonly itemOf: Int32Array
  readonly connectionOf: Int32Array
  readonly done: Uint8Array
  remaining: number

  constructor(items: number[][], readonly connections: PlannedConnection[], socketCount: number) {
    this.sockets = items.map(s => [...s])
    this.sizes = items.map(s => s.length)
    this.itemOf = new Int32Array(socketCount).fill(-1)
    this.connectionOf = new Int32Array(socketCount).fill(-1)
    this.done = new Uint8Array(connections.length)
    this.remaining = connections.length
    items.forEach((s, i) => s.forEach(socket => (this.itemOf[socket] = i)))
    connections.forEach((c, i) => {
      this.connectionOf[c.a] = i
      this.connectionOf[c.b] = i
    })
  }

  /** Connections still to make between items x and y (x ≠ y). */
  shared(x: number, y: number): number {
    let count = 0
    for (const s of this.sockets[x]!) {
      const c = this.connectionOf[s]!
      if (c < 0 || this.done[c]) continue
      const other = this.connections[c]!.a === s ? this.connections[c]!.b : this.connections[c]!.a
      if (this.itemOf[other] === y) count++
    }
    return count
  }

  items(c: number): [number, number] {
    return [this.itemOf[this.connections[c]!.a]!, this.itemOf[this.connections[c]!.b]!]
  }

  /** Makes connection c; returns its cost in complex multiply-adds per frequency, roughly. */
  join(c: number): number {
    const [x, y] = this.items(c)
    const { a, b } = this.connections[c]!
    this.done[c] = 1
    this.remaining--
    const next = this.sockets.length
    const merged = x === y
      ? this.sockets[x]!.filter(s => s !== a && s !== b)
      : [...this.sockets[x]!.filter(s => s !== a), ...this.sockets[y]!.filter(s => s !== b)]
    this.sockets.push(merged)
    this.sizes.push(merged.length)
    for (const s of merged) this.itemOf[s] = next
    // A loop updates each entry with two products, a merge with one.
    return (x === y ? 2 : 1) * merged.length * merged.length
  }
}

function greedy(score: Score, jitter?: () => number): (state: State) => number {
  let queue: JoinQueue | undefined
  let stamp: Float64Array
  let offset: Float64Array
  let seen = 0
  const keyOf = (state: State, c: number): number => {
    const [x, y] = state.items(c)
    return score(x, y, state.sizes, x === y ? 0 : state.shared(x, y)) + offset[c]!
  }
  return (state) => {
    if (!queue) {
      queue = new JoinQueue()
      stamp = new Float64Array(state.connections.length)
      // A fixed random offset per connection only breaks ties, so keys stay comparable.
      offset = Float64Array.from(state.connections, () => (jitter ? jitter() * 0.5 : 0))
      state.connections.forEach((_, c) => {
        stamp[c] = keyOf(state, c)
        queue!.push(stamp[c]!, c)
      })
      seen = state.sockets.length
    }
    // Items made by the last join change the keys of their pending connections.
    for (let item = seen; item < state.sockets.length; item++) {
      for (const s of state.sockets[item]!) {
        const c = state.connectionOf[s]!
        if (c < 0 || state.done[c]) continue
        const key = keyOf(state, c)
        if (key !== stamp[c]) {
          stamp[c] = key
          queue.push(key, c)
        }
      }
    }
    seen = state.sockets.length
    for (;;) {
      const c = queue.pop()
      // An entry whose key is no longer the connection's latest is a leftover; skip it.
      if (state.done[c] || queue.poppedKey !== stamp[c]) continue
      const key = keyOf(state, c)
      if (key !== stamp[c]) {
        stamp[c] = key
        queue.push(key, c)
        continue
      }
      return c
    }
  }
}

/**
 * Chooses the order in which connections are joined, once per topology. 'auto' simulates
 * several greedy rules (smallest item after all joins between a pair, after the next join,
 * least work) and a few randomised ones on small networks, and keeps the cheapest.
 * 'document' keeps the order the connections were made; 'random' shuffles with `seed`.
 */
export function chooseJoinOrder(
  items: number[][],
  connections: PlannedConnection[],
  socketCount: number,
  order: JoinOrder = 'auto',
  seed = 1,
): number[] {
  const sequence = connections.map((_, c) => c)
  if (order === 'document') return sequence
  if (order === 'random') {
    const random = seededRandom(seed)
    for (let i = sequence.length - 1; i > 0; i--) {
      const j = Math.floor(random() * (i + 1))
      ;[sequence[i], sequence[j]] = [sequence[j]!, sequence[i]!]
    }
    return sequence
  }
  const candidates: Simulation[] = [
    simulate(items, connections, socketCount, greedy(byFinalSize)),
    simulate(items, connections, socketCount, greedy(byNextSize)),
    simulate(items, connections, socketCount, greedy(byWork)),
    simulate(items, connections, socketCount, sequence),
  ]
  if (connections.length <= 200) {
    const random = seededRandom(7)
    for (let trial = 0; trial < 24; trial++) {
      candidates.push(simulate(items, connections, socketCount, greedy(trial % 2 ? byFinalSize : byWork, random)))
    }
  }
  candidates.sort((p, q) => p.cost - q.cost)
  return candidates[0]!.order
}
