import type { BlockSpec, NetworkDocument, ParamValue } from '../network/types'

/** What a comparison row is about. */
export type DiffArea = 'block' | 'parameter' | 'wire' | 'variable' | 'setting'
export type DiffChange = 'added' | 'removed' | 'changed'

/**
 * One row of a comparison. `subject` names the thing ("TA", "TA.impedance", "P1.1 – TA.1",
 * "f0", "sweep.stop"); `before`/`after` are the values as written, absent where the thing
 * did not exist on that side.
 */
export interface DiffEntry {
  area: DiffArea
  change: DiffChange
  subject: string
  before?: string
  after?: string
}

export interface DocumentDiff {
  entries: DiffEntry[]
  counts: Record<DiffChange, number>
  /** Blocks that only moved or turned on the canvas: not a design change, so not listed as rows. */
  movedOnly: string[]
}

/** A value as written, for the table: numbers as numbers, expressions as they were typed. */
function written(value: unknown): string {
  if (value === undefined) return ''
  if (typeof value === 'string') return value
  return JSON.stringify(value)
}

function same(a: unknown, b: unknown): boolean {
  return JSON.stringify(canonical(a)) === JSON.stringify(canonical(b))
}

/** Key order must not make two equal objects differ. */
function canonical(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(canonical)
  if (value && typeof value === 'object') {
    return Object.fromEntries(Object.keys(value).sort().map(k => [k, canonical((value as Record<string, unknown>)[k])]))
  }
  return value
}

/** Wires are unordered pairs: "A.1 – B.2" and "B.2 – A.1" are one wire. */
function wireKey(wire: readonly [string, string]): string {
  return [...wire].sort().join(' – ')
}

function compareRecords(
  area: DiffArea, prefix: string,
  before: Record<string, unknown>, after: Record<string, unknown>, out: DiffEntry[],
): void {
  const names = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort()
  for (const name of names) {
    const inBefore = Object.hasOwn(before, name), inAfter = Object.hasOwn(after, name)
    const subject = `${prefix}${name}`
    if (!inBefore) out.push({ area, change: 'added', subject, after: written(after[name]) })
    else if (!inAfter) out.push({ area, change: 'removed', subject, before: written(before[name]) })
    else if (!same(before[name], after[name])) out.push({ area, change: 'changed', subject, before: written(before[name]), after: written(after[name]) })
  }
}

/** Block fields other than id, type, params and layout (the solver may read them). */
function extras(block: BlockSpec): Record<string, unknown> {
  const { id: _id, type: _type, params: _params, layout: _layout, ...rest } = block
  return rest
}

function compareBlocks(before: BlockSpec[], after: BlockSpec[], out: DiffEntry[], movedOnly: string[]): void {
  const a = new Map(before.map(b => [b.id, b]))
  const b = new Map(after.map(x => [x.id, x]))
  const ids = [...new Set([...a.keys(), ...b.keys()])].sort()
  for (const id of ids) {
    const x = a.get(id), y = b.get(id)
    if (!x) out.push({ area: 'block', change: 'added', subject: id, after: y!.type })
    else if (!y) out.push({ area: 'block', change: 'removed', subject: id, before: x.type })
    else {
      const rows: DiffEntry[] = []
      if (x.type !== y.type) rows.push({ area: 'block', change: 'changed', subject: id, before: x.type, after: y.type })
      compareRecords('parameter', `${id}.`, x.params as Record<string, ParamValue>, y.params as Record<string, ParamValue>, rows)
      compareRecords('parameter', `${id}.`, extras(x), extras(y), rows)
      out.push(...rows)
      if (!rows.length && !same(x.layout, y.layout)) movedOnly.push(id)
    }
  }
}

function compareWires(before: NetworkDocument['wires'], after: NetworkDocument['wires'], out: DiffEntry[]): void {
  const a = new Set(before.map(wireKey))
  const b = new Set(after.map(wireKey))
  for (const key of [...a].filter(k => !b.has(k)).sort()) out.push({ area: 'wire', change: 'removed', subject: key })
  for (const key of [...b].filter(k => !a.has(k)).sort()) out.push({ area: 'wire', change: 'added', subject: key })
}

/** Document-level settings compared field by field; sweep and substrates by their own fields. */
function compareSettings(before: NetworkDocument, after: NetworkDocument, out: DiffEntry[]): void {
  const plain = (d: NetworkDocument): Record<string, unknown> => {
    const { format: _f, version: _v, blocks: _b, wires: _w, variables: _vars, sweep: _s, substrates: _sub, ...rest } = d
    return rest
  }
  compareRecords('setting', '', plain(before), plain(after), out)
  compareRecords('setting', 'sweep.', before.sweep ?? {}, after.sweep ?? {}, out)
  compareRecords('setting', 'substrate ', before.substrates ?? {}, after.substrates ?? {}, out)
}

/**
 * What changed from `before` to `after`: blocks added, removed or retyped, every parameter
 * value added, removed or changed (as written, so "Z0/sqrt(2)" → 35.36 counts), wires as
 * unordered pairs, variables and document settings. Canvas positions are not design changes
 * and only show up in `movedOnly`. Rows come blocks first, then wires, variables, settings.
 */
export function diffDocuments(before: NetworkDocument, after: NetworkDocument): DocumentDiff {
  const entries: DiffEntry[] = []
  const movedOnly: string[] = []
  compareBlocks(before.blocks ?? [], after.blocks ?? [], entries, movedOnly)
  compareWires(before.wires ?? [], after.wires ?? [], entries)
  compareRecords('variable', '', before.variables ?? {}, after.variables ?? {}, entries)
  compareSettings(before, after, entries)
  const counts: Record<DiffChange, number> = { added: 0, removed: 0, changed: 0 }
  for (const e of entries) counts[e.change]++
  return { entries, counts, movedOnly }
}
