/**
 * Who else is in a live network, from the presence (awareness) states: a
 * name, initials and a colour per person, and what they have selected. The
 * server writes `user` into every state, so names cannot be made up by peers.
 */
import { TRACE_COLOURS } from './tracePalette'

/** One other person in the network (one entry per browser tab). */
export interface PresencePeer {
  clientId: number
  userId: string
  name: string
  initials: string
  colour: string
  role: string
  /** Ids of the blocks they have selected. */
  selection: string[]
}

// The colour-blind-safe palette of the plots, without its yellow: too faint for an outline on paper.
const PRESENCE_COLOURS = TRACE_COLOURS.filter(c => c !== 'rgb(240, 228, 66)')

/** "Ines Okafor-Lund" → "IO"; one word gives its first two letters. */
export function initialsOf(name: string): string {
  const words = name.trim().split(/\s+/).filter(Boolean)
  if (!words.length) return '?'
  if (words.length === 1) return words[0]!.slice(0, 2).toUpperCase()
  return (words[0]![0]! + words[words.length - 1]![0]!).toUpperCase()
}

/** A colour fixed per user (the same in every browser), from a hash of the user id. */
export function colourFor(userId: string): string {
  let hash = 0
  for (let i = 0; i < userId.length; i++) hash = (hash * 31 + userId.charCodeAt(i)) >>> 0
  return PRESENCE_COLOURS[hash % PRESENCE_COLOURS.length]!
}

interface PresenceState { user?: { id?: unknown, name?: unknown, role?: unknown }, selection?: unknown }

/** The other people from an awareness state map, ordered by name; states without a server-stamped user are skipped. */
export function peersFrom(states: Map<number, Record<string, unknown>>, ownClientId: number): PresencePeer[] {
  const out: PresencePeer[] = []
  for (const [clientId, raw] of states) {
    if (clientId === ownClientId) continue
    const state = raw as PresenceState
    const id = typeof state.user?.id === 'string' ? state.user.id : ''
    if (!id) continue
    const name = typeof state.user?.name === 'string' && state.user.name ? state.user.name : 'Someone'
    const selection = Array.isArray(state.selection) ? state.selection.filter((s): s is string => typeof s === 'string').slice(0, 500) : []
    out.push({ clientId, userId: id, name, initials: initialsOf(name), colour: colourFor(id), role: String(state.user?.role ?? ''), selection })
  }
  return out.sort((a, b) => a.name.localeCompare(b.name) || a.clientId - b.clientId)
}

/** Block id → the people who have it selected, for the canvas outlines. */
export function selectionsByBlock(peers: PresencePeer[]): Record<string, PresencePeer[]> {
  const out: Record<string, PresencePeer[]> = {}
  for (const peer of peers) for (const id of peer.selection) (out[id] ??= []).push(peer)
  return out
}
