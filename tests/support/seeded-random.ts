// The solver's own seeded generator (mulberry32), so fuzz tests and random join orders share one implementation.
export { seededRandom } from '../../shared/solver/join-order'

/** One of the items, chosen by `random`. */
export function pick<T>(random: () => number, items: readonly T[]): T {
  return items[Math.floor(random() * items.length)]!
}
