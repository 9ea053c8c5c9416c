/**
 * The trace grid of an N-port: rows are the port a wave arrives at ("to", i),
 * columns the port it was sent into ("from", j), so cell (i, j) is S(i)(j).
 * Groups (a row, a column, the reflections) toggle together.
 */
import { traceName } from './traces'

/** Every trace into port `to` (one row of the grid). */
export function rowTraces(to: number, ports: number): string[] {
  return Array.from({ length: ports }, (_, k) => traceName({ i: to, j: k + 1 }, ports))
}

/** Every trace out of port `from` (one column: from this input to all). */
export function columnTraces(from: number, ports: number): string[] {
  return Array.from({ length: ports }, (_, k) => traceName({ i: k + 1, j: from }, ports))
}

/** The reflections S11 … SNN (the diagonal). */
export function reflectionTraces(ports: number): string[] {
  return Array.from({ length: ports }, (_, k) => traceName({ i: k + 1, j: k + 1 }, ports))
}

/** One click on a group: when all of it is shown it goes; otherwise what is missing is added (in grid order, after the rest). */
export function toggleGroup(chosen: readonly string[], group: readonly string[]): string[] {
  const all = group.every(n => chosen.includes(n))
  return all ? chosen.filter(n => !group.includes(n)) : [...chosen, ...group.filter(n => !chosen.includes(n))]
}

/** N when `available` is the full N×N set of an N-port (N ≥ 2) in grid order, else 0 (then a plain list is shown). */
export function gridSize(available: readonly string[]): number {
  const n = Math.round(Math.sqrt(available.length))
  if (n < 2 || n * n !== available.length) return 0
  for (let i = 1; i <= n; i++) for (let j = 1; j <= n; j++) if (available[(i - 1) * n + j - 1] !== traceName({ i, j }, n)) return 0
  return n
}
