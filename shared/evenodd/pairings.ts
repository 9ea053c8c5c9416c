import type { MirrorPairs } from './types'

/** The three ways of pairing four ports as mirror images, each with port 1 first. */
export const MIRROR_PAIRINGS: readonly MirrorPairs[] = [
  [[1, 4], [2, 3]],
  [[1, 3], [2, 4]],
  [[1, 2], [4, 3]],
]

/** Reads `[[a, b], [c, d]]` from a hostile document value: four distinct ports 1…4, else null. */
export function parseMirrorPairs(value: unknown): MirrorPairs | null {
  if (!Array.isArray(value) || value.length !== 2) return null
  const flat: number[] = []
  for (const pair of value) {
    if (!Array.isArray(pair) || pair.length !== 2) return null
    for (const n of pair) {
      if (!Number.isInteger(n) || n < 1 || n > 4) return null
      flat.push(n as number)
    }
  }
  if (new Set(flat).size !== 4) return null
  return [[flat[0]!, flat[1]!], [flat[2]!, flat[3]!]]
}

/** Short words for a pairing: "1↔4, 2↔3". */
export function pairingLabel(pairs: MirrorPairs): string {
  return pairs.map(([a, b]) => `${a}↔${b}`).join(', ')
}
