/** Names typed in the editor: a network's name and a block's id, checked before they are written. */
import type { NetworkDocument } from '~~/shared/network/types'

/** Longest network name (the server and the contract's schema hold the same limit). */
export const NETWORK_NAME_MAX = 200
/** Longest block id the editor gives (the contract allows 40; labels on the canvas stay readable at 32). */
export const BLOCK_ID_MAX = 32

/** The name to store, trimmed, or why it cannot be one. */
export function checkNetworkName(text: string): { ok: true, name: string } | { ok: false, message: string } {
  const name = text.trim()
  if (!name) return { ok: false, message: 'The network name is empty: enter a name such as "Branch-line hybrid, 2.45 GHz"' }
  if (name.length > NETWORK_NAME_MAX) return { ok: false, message: `The network name is too long: ${name.length} characters, at most ${NETWORK_NAME_MAX}` }
  return { ok: true, name }
}

/** Why `to` cannot be the new id of block `from`, or null when it can. */
export function blockIdProblem(doc: NetworkDocument, from: string, to: string): string | null {
  if (!to) return 'The block name is empty: enter a name such as LN1'
  if (to.length > BLOCK_ID_MAX) return `The block name is too long: ${to.length} characters, at most ${BLOCK_ID_MAX}`
  if (!/^[A-Za-z_]/.test(to)) return 'A block name starts with a letter or _'
  if (!/^[A-Za-z0-9_]+$/.test(to)) return 'A block name uses letters, digits and _ only'
  if (to !== from && doc.blocks.some(b => b.id === to)) return `Another block is already called ${to}`
  return null
}
