/**
 * The Yjs ↔ contract JSON mapping: every shipped example goes in and comes
 * back byte for byte (key order included), edits written as a new JSON
 * document touch only what changed, and concurrent edits from two replicas
 * merge instead of overwriting each other.
 */
import { readFileSync, readdirSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import * as Y from 'yjs'
import type { NetworkDocument } from '../../../shared/network/types'
import { createNetworkReader, hasNetwork, networkToYDoc, readNetwork, writeNetwork, writeNetworkChanges } from '../../../shared/live/network-ydoc'

const examplesDir = join(process.cwd(), 'shared', 'examples')
const exampleFiles = readdirSync(examplesDir).filter(f => f.endsWith('.json'))

function example(name: string): NetworkDocument {
  return JSON.parse(readFileSync(join(examplesDir, name), 'utf8')) as NetworkDocument
}

/** A second replica made from the first one's state, as a client gets it over the wire. */
function replicaOf(doc: Y.Doc): Y.Doc {
  const copy = new Y.Doc()
  Y.applyUpdate(copy, Y.encodeStateAsUpdate(doc))
  return copy
}

function exchange(a: Y.Doc, b: Y.Doc): void {
  const fromA = Y.encodeStateAsUpdate(a, Y.encodeStateVector(b))
  const fromB = Y.encodeStateAsUpdate(b, Y.encodeStateVector(a))
  Y.applyUpdate(b, fromA)
  Y.applyUpdate(a, fromB)
}

function edit(doc: Y.Doc, change: (d: NetworkDocument) => void): void {
  const next = readNetwork(doc)
  change(next)
  doc.transact(() => writeNetwork(doc, next))
}

describe('Yjs mapping of the network document', () => {
  it('finds the shipped examples', () => {
    expect(exampleFiles).toContain('branch-line-hybrid.json')
    expect(exampleFiles.length).toBeGreaterThanOrEqual(5)
  })

  for (const file of exampleFiles) {
    it(`round-trips ${file} exactly, also through an encoded update`, () => {
      const text = readFileSync(join(examplesDir, file), 'utf8')
      const original = JSON.parse(text) as NetworkDocument
      const doc = networkToYDoc(original)
      expect(JSON.stringify(readNetwork(doc))).toBe(JSON.stringify(original))
      const other = replicaOf(doc)
      expect(JSON.stringify(readNetwork(other), null, 2)).toBe(JSON.stringify(JSON.parse(text), null, 2))
    })
  }

  it('keeps unknown keys, numbers in SI and nested extras', () => {
    const doc: NetworkDocument = {
      format: 'portwright.network', version: 1, name: 'extras', referenceImpedance: 75,
      substrates: { core: { permittivity: 3.5, height: '0.5 mm', conductivity: 5.8e7, lossTangent: 0.0031 } },
      blocks: [{ id: 'P1', type: 'port', params: { index: 1, impedance: 1.25e-3 }, layout: { x: -40, y: 12.5, rotation: 90, flip: true }, note: { tags: ['a', 'b'] } }],
      wires: [],
      vendorData: { nested: [1, { two: null }], flag: false },
    }
    expect(JSON.stringify(readNetwork(replicaOf(networkToYDoc(doc))))).toBe(JSON.stringify(doc))
  })

  it('is empty before a client has synced', () => {
    expect(hasNetwork(new Y.Doc())).toBe(false)
    expect(hasNetwork(networkToYDoc(example('ring-hybrid.json')))).toBe(true)
  })

  it('writes a parameter change as a small update, not a rewrite', () => {
    const doc = networkToYDoc(example('line-chain-100.json'))
    const whole = Y.encodeStateAsUpdate(doc).length
    const before = Y.encodeStateVector(doc)
    edit(doc, (d) => { d.blocks[50]!.params.impedance = 61 })
    const delta = Y.encodeStateAsUpdate(doc, before).length
    expect(readNetwork(doc).blocks[50]!.params.impedance).toBe(61)
    expect(delta).toBeLessThan(whole / 50)
  })

  it('merges concurrent edits of two parameters of one block and of two different blocks', () => {
    const a = networkToYDoc(example('branch-line-hybrid.json'))
    const b = replicaOf(a)
    const id = readNetwork(a).blocks.find(x => x.type === 'line')!.id
    edit(a, (d) => { d.blocks.find(x => x.id === id)!.params.impedance = 'Z0/2' })
    edit(b, (d) => { d.blocks.find(x => x.id === id)!.params.degrees = 45 })
    edit(b, (d) => { d.variables = { ...d.variables, k: '3' } })
    edit(a, (d) => { d.name = 'renamed by a' })
    exchange(a, b)
    const merged = readNetwork(a)
    expect(JSON.stringify(readNetwork(b))).toBe(JSON.stringify(merged))
    const block = merged.blocks.find(x => x.id === id)!
    expect(block.params.impedance).toBe('Z0/2')
    expect(block.params.degrees).toBe(45)
    expect(merged.variables!.k).toBe('3')
    expect(merged.name).toBe('renamed by a')
  })

  it('keeps both of two concurrently added blocks and wires, and a concurrent delete', () => {
    const a = networkToYDoc(example('wilkinson-divider.json'))
    const b = replicaOf(a)
    const start = readNetwork(a)
    const firstWire = start.wires[0]!
    edit(a, (d) => {
      d.blocks.push({ id: 'XA', type: 'load', params: { resistance: 50 } })
      d.wires.push(['XA.1', start.blocks[0]!.id + '.1'])
    })
    edit(b, (d) => {
      d.blocks.push({ id: 'XB', type: 'load', params: { resistance: 75 } })
      d.wires = d.wires.slice(1)
    })
    exchange(a, b)
    const merged = readNetwork(a)
    expect(JSON.stringify(readNetwork(b))).toBe(JSON.stringify(merged))
    expect(merged.blocks.map(x => x.id)).toEqual(expect.arrayContaining(['XA', 'XB']))
    expect(merged.blocks.length).toBe(start.blocks.length + 2)
    expect(merged.wires).not.toContainEqual(firstWire)
    expect(merged.wires.length).toBe(start.wires.length)
  })

  it('updates a renamed block in place and keeps key order when a variable is renamed', () => {
    const doc = networkToYDoc(example('branch-line-hybrid.json'))
    const map = doc.getMap('network')
    edit(doc, (d) => {
      d.blocks[1]!.id = 'RENAMED'
      d.variables = Object.fromEntries(Object.entries(d.variables!).map(([k, v]) => [k === 'f0' ? 'fc' : k, v]))
    })
    const after = readNetwork(doc)
    expect(after.blocks[1]!.id).toBe('RENAMED')
    expect(Object.keys(after.variables!)).toEqual(['fc', 'Z0'])
    expect(doc.getMap('network')).toBe(map)
    expect(JSON.stringify(readNetwork(replicaOf(doc)))).toBe(JSON.stringify(after))
  })

  it('writing the same document again changes nothing', () => {
    const doc = networkToYDoc(example('butler-matrix-4x4.json'))
    const before = Y.encodeStateVector(doc)
    doc.transact(() => writeNetwork(doc, readNetwork(doc)))
    expect(Y.encodeStateVector(doc)).toEqual(before)
  })

  it('a targeted write of one parameter matches a full write, and the reader keeps unchanged parts', () => {
    const doc = networkToYDoc(example('butler-matrix-4x4.json'))
    const twin = replicaOf(doc)
    const reader = createNetworkReader(doc)
    doc.on('afterTransaction', tr => reader.changed(tr))
    const before = reader.read()
    expect(Object.isFrozen(before.blocks[0])).toBe(true)
    const k = before.blocks.findIndex(b => Object.keys(b.params ?? {}).length > 0)
    const param = Object.keys(before.blocks[k]!.params)[0]!
    const next = structuredClone(before) as NetworkDocument
    next.blocks[k]!.params[param] = 12.5
    const sv = Y.encodeStateVector(doc)
    doc.transact(() => writeNetworkChanges(doc, before, next))
    twin.transact(() => writeNetwork(twin, next))
    const after = reader.read()
    expect(JSON.stringify(after)).toBe(JSON.stringify(next))
    expect(JSON.stringify(readNetwork(doc))).toBe(JSON.stringify(readNetwork(twin)))
    // Only the edited parameter went into the update.
    expect(Y.encodeStateAsUpdate(doc, sv).length).toBeLessThan(200)
    expect(after.blocks[k]).not.toBe(before.blocks[k])
    for (let i = 0; i < after.blocks.length; i++) if (i !== k) expect(after.blocks[i]).toBe(before.blocks[i])
    expect(after.wires).toBe(before.wires)
    // A remote change reaches the reader too.
    const remote = replicaOf(doc)
    edit(remote, (d) => { d.name = 'renamed elsewhere' })
    exchange(doc, remote)
    expect(reader.read().name).toBe('renamed elsewhere')
    expect(reader.read().blocks).toBe(after.blocks)
    // A structural change (removing a block) falls back to the full sync.
    const fewer = structuredClone(reader.read()) as NetworkDocument
    fewer.blocks.splice(k, 1)
    doc.transact(() => writeNetworkChanges(doc, reader.read(), fewer))
    expect(JSON.stringify(reader.read())).toBe(JSON.stringify(fewer))
  })
})
