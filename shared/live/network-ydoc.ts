/**
 * The network document (contract version 1) inside a Yjs document, and back.
 *
 * One root map, `network`, holds the whole document as an "ordered object":
 * a Y.Map with `v` (a Y.Map of the values) and `k` (a Y.Array of the keys in
 * order). Plain Y.Maps do not keep key order across replicas, and the contract
 * mapping must round-trip exactly, key order included. Arrays become Y.Arrays;
 * an element that is a JSON object becomes an ordered object (so two people can
 * edit two parameters of one block at once), anything else (a wire, a number)
 * is stored whole.
 *
 * `writeNetwork` turns the Yjs side into a given JSON document with the fewest
 * changes it can find, so that concurrent edits of different parts merge.
 * Runs in the browser and in Node; no other dependency than yjs.
 */
import * as Y from 'yjs'
import type { NetworkDocument } from '../network/types'

/** Name of the one root type; anything else in an update is refused by the server. */
export const NETWORK_ROOT = 'network'

type Json = null | boolean | number | string | Json[] | { [key: string]: Json }
type JsonObject = { [key: string]: Json }

function isObject(value: unknown): value is JsonObject {
  return typeof value === 'object' && value !== null && !Array.isArray(value)
}

function copyAtom(value: unknown): Json {
  // Values stored whole are shared with Yjs' own structures: hand out copies only.
  return (value !== null && typeof value === 'object') ? structuredClone(value) as Json : value as Json
}

function sameJson(a: unknown, b: unknown): boolean {
  return a === b || JSON.stringify(a) === JSON.stringify(b)
}

// ---------- reading ----------

function readValue(value: unknown): Json {
  if (value instanceof Y.Map) return readObject(value)
  if (value instanceof Y.Array) return value.toArray().map(readValue)
  return copyAtom(value)
}

function keyOrder(map: Y.Map<unknown>): string[] {
  const values = map.get('v') as Y.Map<unknown> | undefined
  const keys = map.get('k') as Y.Array<string> | undefined
  if (!values) return []
  const out: string[] = []
  const seen = new Set<string>()
  // Concurrent additions of one key leave it twice in the order list: the first one counts.
  for (const key of keys?.toArray() ?? []) {
    if (!seen.has(key) && values.has(key)) {
      seen.add(key)
      out.push(key)
    }
  }
  // A value whose key never made it into the order list still belongs to the object; sorting keeps replicas equal.
  for (const key of [...values.keys()].sort()) if (!seen.has(key)) out.push(key)
  return out
}

function readObject(map: Y.Map<unknown>): JsonObject {
  const values = map.get('v') as Y.Map<unknown> | undefined
  const out: JsonObject = {}
  for (const key of keyOrder(map)) out[key] = readValue(values!.get(key))
  return out
}

/** The contract JSON of a Yjs network document (a fresh object each call). */
export function readNetwork(doc: Y.Doc): NetworkDocument {
  return readObject(doc.getMap(NETWORK_ROOT)) as unknown as NetworkDocument
}

function freeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value)
    for (const v of Object.values(value as object)) freeze(v)
  }
  return value
}

/**
 * Reads the network again and again, re-reading only the parts that changed:
 * call `changed(transaction)` after each transaction, then `read()`. The
 * result is frozen, and the parts that did not change keep their identity from
 * one read to the next (an edit of one block makes a new block, a new blocks
 * array and a new root object, nothing else).
 */
export function createNetworkReader(doc: Y.Doc): { read: () => NetworkDocument, changed: (tr: Y.Transaction) => void } {
  const cache = new WeakMap<object, Json>()
  const root = doc.getMap(NETWORK_ROOT)
  function read(value: unknown): Json {
    if (value instanceof Y.Map || value instanceof Y.Array) {
      const hit = cache.get(value)
      if (hit !== undefined) return hit
      let out: Json
      if (value instanceof Y.Map) {
        const values = value.get('v') as Y.Map<unknown> | undefined
        const obj: JsonObject = {}
        for (const key of keyOrder(value)) obj[key] = read(values!.get(key))
        out = obj
      }
      else out = value.toArray().map(read)
      Object.freeze(out)
      cache.set(value, out)
      return out
    }
    return freeze(copyAtom(value))
  }
  return {
    read: () => read(root) as unknown as NetworkDocument,
    changed(tr) {
      for (const type of tr.changed.keys()) {
        let t: unknown = type
        while (t instanceof Y.AbstractType) {
          cache.delete(t)
          t = t._item?.parent
        }
      }
    },
  }
}

/** Whether the Yjs document holds a network yet (a new client's document is empty until it syncs). */
export function hasNetwork(doc: Y.Doc): boolean {
  return doc.getMap(NETWORK_ROOT).has('v')
}

// ---------- writing ----------

function toY(value: Json): unknown {
  if (isObject(value)) {
    const map = new Y.Map<unknown>()
    fillObject(map, value)
    return map
  }
  if (Array.isArray(value)) {
    const arr = new Y.Array<unknown>()
    arr.insert(0, value.map(elementToY))
    return arr
  }
  return value
}

/** Array elements: objects become ordered objects, anything else is stored whole. */
function elementToY(value: Json): unknown {
  return isObject(value) ? toY(value) : copyAtom(value)
}

function fillObject(map: Y.Map<unknown>, value: JsonObject): void {
  const values = new Y.Map<unknown>()
  const keys = new Y.Array<string>()
  map.set('v', values)
  map.set('k', keys)
  const names = Object.keys(value).filter(k => value[k] !== undefined)
  for (const key of names) values.set(key, toY(value[key]!))
  keys.insert(0, names)
}

function syncObject(map: Y.Map<unknown>, value: JsonObject): void {
  let values = map.get('v') as Y.Map<unknown> | undefined
  let keys = map.get('k') as Y.Array<string> | undefined
  if (!(values instanceof Y.Map) || !(keys instanceof Y.Array)) {
    fillObject(map, value)
    return
  }
  const names = Object.keys(value).filter(k => value[k] !== undefined)
  const wanted = new Set(names)
  for (const key of [...values.keys()]) if (!wanted.has(key)) values.delete(key)
  for (const key of names) syncSlot(values, key, value[key]!)
  syncKeyOrder(keys, names)
}

/** Keep the order list equal to `names`: append new keys, drop removed ones, rewrite only when the order itself changed. */
function syncKeyOrder(keys: Y.Array<string>, names: string[]): void {
  const wanted = new Set(names)
  const current = keys.toArray()
  for (let i = current.length - 1; i >= 0; i--) {
    if (!wanted.has(current[i]!) || current.indexOf(current[i]!) !== i) keys.delete(i, 1)
  }
  const present = new Set(keys.toArray())
  const missing = names.filter(n => !present.has(n))
  if (missing.length) keys.push(missing)
  const now = keys.toArray()
  if (now.length !== names.length || now.some((k, i) => k !== names[i])) {
    keys.delete(0, keys.length)
    keys.insert(0, names)
  }
}

function syncSlot(values: Y.Map<unknown>, key: string, next: Json): void {
  const current = values.get(key)
  if (isObject(next) && current instanceof Y.Map) syncObject(current, next)
  else if (Array.isArray(next) && current instanceof Y.Array) syncArray(current, next)
  else if (current instanceof Y.AbstractType || !sameJson(current, next)) values.set(key, toY(next))
}

/** Identity of an array element for matching old and new: a block's id, or the whole value. */
function elementKey(value: unknown): string {
  if (value instanceof Y.Map) {
    const id = (value.get('v') as Y.Map<unknown> | undefined)?.get('id')
    return typeof id === 'string' ? `#${id}` : `@${JSON.stringify(readValue(value))}`
  }
  if (value instanceof Y.Array) return `@${JSON.stringify(readValue(value))}`
  if (isObject(value)) return typeof value.id === 'string' ? `#${value.id}` : `@${JSON.stringify(value)}`
  return `@${JSON.stringify(value)}`
}

/** Largest middle part for which a longest-common-subsequence match is worth its quadratic cost. */
const LCS_LIMIT = 250_000

/** Pairs of matching indices (old, new) by key, in order: a longest common subsequence. */
function matchKeys(a: string[], b: string[]): Array<[number, number]> {
  const n = a.length
  const m = b.length
  if (n === 0 || m === 0 || n * m > LCS_LIMIT) return []
  const table = Array.from({ length: n + 1 }, () => new Uint32Array(m + 1))
  for (let i = n - 1; i >= 0; i--) {
    for (let j = m - 1; j >= 0; j--) {
      table[i]![j] = a[i] === b[j] ? table[i + 1]![j + 1]! + 1 : Math.max(table[i + 1]![j]!, table[i]![j + 1]!)
    }
  }
  const pairs: Array<[number, number]> = []
  let i = 0
  let j = 0
  while (i < n && j < m) {
    if (a[i] === b[j]) { pairs.push([i++, j++]) }
    else if (table[i + 1]![j]! >= table[i]![j + 1]!) i++
    else j++
  }
  return pairs
}

function syncElement(arr: Y.Array<unknown>, index: number, next: Json): void {
  const current = arr.get(index)
  if (isObject(next) && current instanceof Y.Map) { syncObject(current, next); return }
  if (current instanceof Y.AbstractType || !sameJson(current, next)) {
    arr.delete(index, 1)
    arr.insert(index, [elementToY(next)])
  }
}

/**
 * Turn a Y.Array into `next` touching as few elements as possible: unchanged
 * elements keep their identity (a concurrent edit inside them survives),
 * elements matched by key are updated in place, a run replaced by a run of the
 * same length (a renamed block) is updated position by position.
 */
function syncArray(arr: Y.Array<unknown>, next: Json[]): void {
  const oldKeys = arr.toArray().map(elementKey)
  const newKeys = next.map(elementKey)
  let start = 0
  while (start < oldKeys.length && start < newKeys.length && oldKeys[start] === newKeys[start]) start++
  let endOld = oldKeys.length
  let endNew = newKeys.length
  while (endOld > start && endNew > start && oldKeys[endOld - 1] === newKeys[endNew - 1]) { endOld--; endNew-- }
  const pairs = matchKeys(oldKeys.slice(start, endOld), newKeys.slice(start, endNew))
    .map(([i, j]) => [i + start, j + start] as [number, number])
  pairs.push([endOld, endNew])
  // Work from the end so that indices before the current run stay valid.
  const runs: Array<{ oldFrom: number, oldTo: number, newFrom: number, newTo: number, match?: [number, number] }> = []
  let prevOld = start
  let prevNew = start
  for (const [i, j] of pairs) {
    runs.push({ oldFrom: prevOld, oldTo: i, newFrom: prevNew, newTo: j, match: i < endOld ? [i, j] : undefined })
    prevOld = i + 1
    prevNew = j + 1
  }
  for (const run of runs.reverse()) {
    if (run.match) syncElement(arr, run.match[0], next[run.match[1]]!)
    const oldLen = run.oldTo - run.oldFrom
    const newLen = run.newTo - run.newFrom
    if (oldLen === newLen) {
      for (let k = oldLen - 1; k >= 0; k--) syncElement(arr, run.oldFrom + k, next[run.newFrom + k]!)
    } else {
      if (oldLen) arr.delete(run.oldFrom, oldLen)
      if (newLen) arr.insert(run.oldFrom, next.slice(run.newFrom, run.newTo).map(elementToY))
    }
  }
  // Elements equal by key but different inside (same block id, new params) in the common prefix and suffix.
  for (let k = 0; k < start; k++) syncElement(arr, k, next[k]!)
  const tail = newKeys.length - endNew
  for (let k = 0; k < tail; k++) syncElement(arr, arr.length - tail + k, next[endNew + k]!)
}

/**
 * Make the Yjs document hold `document`, changing only what differs. Call it
 * inside `doc.transact(…, origin)` to make the change one transaction with an
 * origin (the undo manager tracks the local origin only).
 */
export function writeNetwork(doc: Y.Doc, document: NetworkDocument): void {
  const root = doc.getMap<unknown>(NETWORK_ROOT)
  syncObject(root, JSON.parse(JSON.stringify(document)) as JsonObject)
}

/**
 * Like `writeNetwork`, for a document known to hold `previous` (the last read
 * of it): only the top-level values and array elements that differ between
 * `previous` and `document` are synced, so a one-parameter edit touches one
 * block and nothing else is walked. The result is the same as `writeNetwork`.
 */
export function writeNetworkChanges(doc: Y.Doc, previous: NetworkDocument, document: NetworkDocument): void {
  const root = doc.getMap<unknown>(NETWORK_ROOT)
  const before = previous as unknown as JsonObject
  const next = JSON.parse(JSON.stringify(document)) as JsonObject
  const values = root.get('v')
  const keys = root.get('k')
  const names = Object.keys(next)
  const oldNames = Object.keys(before)
  if (!(values instanceof Y.Map) || !(keys instanceof Y.Array) || names.length !== oldNames.length
    || names.some((k, i) => k !== oldNames[i]) || keys.length !== names.length) {
    syncObject(root, next)
    return
  }
  for (const key of names) {
    const a = before[key]
    const b = next[key]!
    const slot = values.get(key)
    if (Array.isArray(a) && Array.isArray(b) && slot instanceof Y.Array && a.length === b.length && slot.length === b.length) {
      for (let i = 0; i < b.length; i++) {
        if (sameJson(a[i], b[i])) continue
        if (elementKey(a[i]) !== elementKey(b[i])) { syncSlot(values, key, b); break }
        syncElement(slot, i, b[i]!)
      }
    }
    else if (!sameJson(a, b)) syncSlot(values, key, b)
  }
}

/** A new Yjs document holding `document` (tests, and the server's first load of a network). */
export function networkToYDoc(document: NetworkDocument, options: { gc?: boolean } = {}): Y.Doc {
  const doc = new Y.Doc({ gc: options.gc ?? true })
  doc.transact(() => writeNetwork(doc, document))
  return doc
}
