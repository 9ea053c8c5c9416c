/**
 * Edits of the document's named substrates as pure functions on a draft (the editor store runs
 * each as one undo step). Renaming a substrate renames it in the blocks that use it.
 */
import type { NetworkDocument, ParamValue, Substrate } from '~~/shared/network/types'

/** The values a new substrate starts with: a common PTFE-ceramic board with copper (illustrative; edit to match your board). */
export const NEW_SUBSTRATE: Readonly<Substrate> = { permittivity: 3.5, height: '0.5 mm', thickness: '35 um', lossTangent: 0.003, conductivity: 5.8e7 }

/** Substrate keys the settings panel edits, in the order shown. */
export const SUBSTRATE_FIELDS = ['permittivity', 'height', 'thickness', 'lossTangent', 'conductivity', 'roughness'] as const
export type SubstrateField = typeof SUBSTRATE_FIELDS[number]

const NAME = /^[A-Za-z_][A-Za-z0-9_-]{0,63}$/

/** First unused name of the form `board`, `board2`, … */
export function freshSubstrateName(doc: NetworkDocument): string {
  const taken = new Set(Object.keys(doc.substrates ?? {}))
  if (!taken.has('board')) return 'board'
  for (let i = 2; ; i++) if (!taken.has(`board${i}`)) return `board${i}`
}

/** Adds a substrate with the starting values; returns its name. */
export function addSubstrate(doc: NetworkDocument): string {
  const name = freshSubstrateName(doc)
  doc.substrates = { ...(doc.substrates ?? {}), [name]: { ...NEW_SUBSTRATE } }
  return name
}

/** Sets one key of a substrate; undefined removes an optional key (the required two are kept). */
export function setSubstrateValue(doc: NetworkDocument, name: string, key: SubstrateField, value: ParamValue | undefined): void {
  const current = doc.substrates?.[name]
  if (!current) return
  const next: Substrate = { ...current }
  if (value === undefined) {
    if (key === 'permittivity' || key === 'height') return
    delete next[key]
  } else next[key] = value
  doc.substrates = { ...doc.substrates, [name]: next }
}

/** Renames a substrate, keeping its place, and updates every block that names it; false for a taken or malformed name. */
export function renameSubstrate(doc: NetworkDocument, from: string, to: string): boolean {
  const substrates = doc.substrates ?? {}
  if (!(from in substrates) || !NAME.test(to) || (to !== from && to in substrates)) return false
  doc.substrates = Object.fromEntries(Object.entries(substrates).map(([k, v]) => [k === from ? to : k, v]))
  for (const block of doc.blocks) if (block.params.substrate === from) block.params.substrate = to
  return true
}

/** Removes a substrate; blocks that named it then show a problem until given another. */
export function removeSubstrate(doc: NetworkDocument, name: string): void {
  const next = { ...doc.substrates }
  delete next[name]
  doc.substrates = next
}
