/** How the joining order is chosen; all give the same S up to rounding. */
export type JoinOrder = 'auto' | 'document' | 'random'

/**
 * Min-heap of (key, id) pairs with lazy deletion, for the greedy join order.
 * Keys are compared first, then ids, so the order is deterministic.
 */
export class JoinQueue {
  private keys: number[] = []
  private ids: number[] = []
  /** Key of the entry last returned by `pop`. */
  poppedKey = Number.NaN

  get size(): number {
    return this.ids.length
  }

  /** Adds a candidate join. */
  push(key: number, id: number): void {
    this.keys.push(key)
    this.ids.push(id)
    let i = this.ids.length - 1
    while (i > 0) {
      const parent = (i - 1) >> 1
      if (!this.less(i, parent)) break
      this.swap(i, parent)
      i = parent
    }
  }

  /** Removes and returns the id with the smallest key, or -1 when empty. */
  pop(): number {
    const count = this.ids.length
    if (count === 0) return -1
    const top = this.ids[0]!
    this.poppedKey = this.keys[0]!
    const lastKey = this.keys.pop()!
    const lastId = this.ids.pop()!
    if (count > 1) {
      this.keys[0] = lastKey
      this.ids[0] = lastId
      let i = 0
      for (;;) {
        const left = 2 * i + 1, right = left + 1
        let smallest = i
        if (left < this.ids.length && this.less(left, smallest)) smallest = left
        if (right < this.ids.length && this.less(right, smallest)) smallest = right
        if (smallest === i) break
        this.swap(i, smallest)
        i = smallest
      }
    }
    return top
  }

  private less(a: number, b: number): boolean {
    return this.keys[a]! < this.keys[b]! || (this.keys[a] === this.keys[b] && this.ids[a]! < this.ids[b]!)
  }

  private swap(a: number, b: number): void {
    const k = this.keys[a]!; this.keys[a] = this.keys[b]!; this.keys[b] = k
    const d = this.ids[a]!; this.ids[a] = this.ids[b]!; this.ids[b] = d
  }
}

/** Deterministic pseudo-random generator (mulberry32) for the 'random' join order used in tests. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0
  return () => {
    state = (state + 0x6d2b79f5) >>> 0
    let t = state
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}
