import { describe, expect, it } from 'vitest'
import { resolveSpec } from '../../../shared/network/spec'
import type { NetworkDocument } from '../../../shared/network/types'

const base = (spec: NetworkDocument['spec'], variables: Record<string, string | number> = {}): NetworkDocument =>
  ({ format: 'portwright.network', version: 1.1, variables, blocks: [], wires: [], spec })

describe('resolveSpec', () => {
  it('is undefined for a document without a spec', () => {
    expect(resolveSpec(base(undefined))).toBeUndefined()
  })

  it('evaluates the centre and the band with the document variables and units', () => {
    const resolved = resolveSpec(base({ center: 'f0', band: { start: 'f0 - 100 MHz', stop: 2.55e9 }, conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] }, { f0: '2.45 GHz' }))
    expect(resolved).toEqual({ ok: true, spec: { center: 2.45e9, band: { start: 2.35e9, stop: 2.55e9 }, conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] } })
  })

  it('names a band whose stop is not above its start, and a port the network does not have', () => {
    const resolved = resolveSpec(base({ center: 1e9, band: { start: '1.1 GHz', stop: '0.9 GHz' }, conditions: [{ measure: 'isolation', from: 1, to: 5, min: 20 }] }), { ports: 4 })
    expect(resolved?.ok).toBe(false)
    if (resolved && !resolved.ok) {
      expect(resolved.problems.map(p => p.message)).toEqual([
        'spec.band: the stop (900 MHz) must be above the start (1.1 GHz)',
        'spec.conditions[0]: port 5 does not exist (the network has 4 ports)',
      ])
    }
  })

  it('names a centre in the wrong unit', () => {
    const resolved = resolveSpec(base({ center: '3 mm', conditions: [] }))
    expect(resolved?.ok).toBe(false)
    if (resolved && !resolved.ok) expect(resolved.problems[0]!.message).toMatch(/^spec\.center: /)
  })
})
