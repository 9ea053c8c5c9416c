import * as Y from 'yjs'
import { NETWORK_ROOT, readNetwork } from './network-ydoc'
import { parseNetworkDocument } from '../network/schema'
import type { NetworkDocument } from '../network/types'

/** Outcome of reading a live document strictly: the valid network, or what is wrong with it. */
export type StrictReadResult = { ok: true; document: NetworkDocument } | { ok: false; reason: string }

const MAX_DEPTH = 32

function checkAtom(value: unknown, path: string, depth: number): string | null {
  if (value === null || typeof value === 'string' || typeof value === 'boolean') return null
  if (typeof value === 'number') return Number.isFinite(value) ? null : `${path} holds a number that is not finite`
  if (depth > MAX_DEPTH) return `${path} is nested too deeply`
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const problem = checkAtom(value[i], `${path}[${i}]`, depth + 1)
      if (problem) return problem
    }
    return null
  }
  if (typeof value === 'object' && Object.getPrototypeOf(value) === Object.prototype) {
    for (const [key, v] of Object.entries(value as Record<string, unknown>)) {
      const problem = checkAtom(v, `${path}.${key}`, depth + 1)
      if (problem) return problem
    }
    return null
  }
  return `${path} holds ${value instanceof Uint8Array ? 'binary data' : `a ${typeof value}`}, which a network document cannot hold`
}

// Only the shapes the JSON↔Yjs mapping writes are allowed: objects as maps of {v: map, k: array of key names},
// arrays as arrays, everything else as plain JSON values.
function checkValue(value: unknown, path: string, depth: number): string | null {
  if (depth > MAX_DEPTH) return `${path} is nested too deeply`
  if (value instanceof Y.Map) return checkObject(value, path, depth)
  if (value instanceof Y.Array) {
    const items = value.toArray()
    for (let i = 0; i < items.length; i++) {
      const problem = checkValue(items[i], `${path}[${i}]`, depth + 1)
      if (problem) return problem
    }
    return null
  }
  if (value instanceof Y.AbstractType) return `${path} is a ${value.constructor.name.replace(/^Y/, '')} type, which a network document cannot hold`
  return checkAtom(value, path, depth)
}

function checkObject(map: Y.Map<unknown>, path: string, depth: number): string | null {
  for (const key of map.keys()) if (key !== 'v' && key !== 'k') return `${path || 'the document'} has the stray entry "${key}"`
  const values = map.get('v')
  const keys = map.get('k')
  if (values === undefined && keys === undefined && path === '') return null
  if (!(values instanceof Y.Map)) return `${path || 'the document'} has no value map`
  if (keys !== undefined && !(keys instanceof Y.Array && keys.toArray().every(k => typeof k === 'string'))) return `${path || 'the document'} has a key order that is not a list of names`
  for (const [key, v] of values.entries()) {
    const problem = checkValue(v, path ? `${path}.${key}` : key, depth + 1)
    if (problem) return problem
  }
  return null
}

/**
 * Reads the network from a live document and checks it against the contract: only the Yjs shapes the
 * mapping writes, then the document schema. Used before an update is logged and before a merge is stored.
 */
export function readNetworkStrict(doc: Y.Doc): StrictReadResult {
  const root = doc.getMap(NETWORK_ROOT)
  const shape = checkObject(root, '', 0)
  if (shape) return { ok: false, reason: shape }
  let document: NetworkDocument
  try {
    document = readNetwork(doc)
  } catch (error) {
    return { ok: false, reason: `the document cannot be read (${(error as Error).message})` }
  }
  const parsed = parseNetworkDocument(document)
  if (!parsed.ok) return { ok: false, reason: parsed.problems[0]?.message ?? 'the document is not valid' }
  return { ok: true, document: parsed.document }
}

/** Applies an update to a scratch copy of `doc` and reads the result strictly; `doc` itself is not touched. */
export function checkUpdateOn(doc: Y.Doc, update: Uint8Array): StrictReadResult {
  const scratch = new Y.Doc()
  try {
    Y.applyUpdate(scratch, Y.encodeStateAsUpdate(doc))
    Y.applyUpdate(scratch, update)
    return readNetworkStrict(scratch)
  } catch (error) {
    return { ok: false, reason: `the update cannot be applied (${(error as Error).message})` }
  } finally {
    scratch.destroy()
  }
}
