import { describe, expect, it } from 'vitest'
import { beamFigures } from '../../../shared/beams/beam-figures'
import { beamWeights } from '../../../shared/beams/beam-weights'
import { parseNetworkDocument, resolveSpec } from '../../../shared/network/index'
import { specMeets } from '../../../shared/rf/spec-meets'
import { solveDocument } from '../../../shared/solver/index'
import { TEMPLATES, findTemplate, templateDataResolver } from '../../../shared/templates/index'
import { prepareTuning, resolveTolerances, resolveTunables } from '../../../shared/tuning/index'

// Trade terms and S-parameter-like names are not block ids of ours.
const TRADE_IDS = /^(TL|MS|RL|S\d\d)/i

describe.each(TEMPLATES.map(t => [t.slug, t] as const))('template %s', (_slug, template) => {
  const document = template.build()
  // Templates with data blocks bring their own files.
  const resolveData = templateDataResolver(template)

  it('is a valid version-1.1 document with a layout for every block and unique ids', () => {
    const parsed = parseNetworkDocument(document)
    expect(parsed.ok, parsed.ok ? '' : parsed.problems.map(p => p.message).join('\n')).toBe(true)
    expect(document.version).toBe(1.1)
    expect(document.name).toMatch(/Quillmere/)
    for (const block of document.blocks) {
      expect(block.layout, block.id).toBeDefined()
      expect(block.id, block.id).not.toMatch(TRADE_IDS)
    }
    expect(new Set(document.blocks.map(b => b.id)).size).toBe(document.blocks.length)
  })

  it('lists the ports the document has', () => {
    const indices = document.blocks.filter(b => b.type === 'port').map(b => Number(b.params.index)).sort((a, b) => a - b)
    expect(template.ports.map(p => p.index)).toEqual(indices)
  })

  it('meets its own spec at the centre', () => {
    const resolved = resolveSpec(document)
    expect(resolved?.ok).toBe(true)
    if (!resolved?.ok) return
    const center = resolved.spec.center
    const solved = solveDocument(document, { sweep: { start: center, stop: center, points: 1 }, resolveData })
    expect(solved.ok, solved.ok ? '' : solved.problems.map(p => p.message).join('\n')).toBe(true)
    if (!solved.ok) return
    const check = specMeets(solved.result, { center, conditions: resolved.spec.conditions })
    expect(check.checked).toBe(1)
    expect(check.met, JSON.stringify(check.worst)).toBe(true)
    expect(resolved.spec.conditions.length).toBeGreaterThanOrEqual(3)
  })

  it('meets its own spec over its band (the contract’s "meets")', () => {
    const prepared = prepareTuning(document, { resolveData })
    expect(prepared.ok, prepared.ok ? '' : prepared.problems.map(p => p.message).join('\n')).toBe(true)
  })

  it('names tunables and tolerances that resolve', () => {
    const prepared = prepareTuning(document, { resolveData })
    if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
    expect(document.tolerances, 'every template has tolerances').toBeDefined()
    const spreads = resolveTolerances(prepared.setup)
    expect(spreads.ok, spreads.ok ? '' : spreads.problems.map(p => p.message).join('\n')).toBe(true)
    if (document.tunables) {
      const ranges = resolveTunables(prepared.setup)
      expect(ranges.ok, ranges.ok ? '' : ranges.problems.map(p => p.message).join('\n')).toBe(true)
    }
  })
})

describe('template index', () => {
  it('has the six templates with one-line descriptions and tags', () => {
    expect(TEMPLATES.map(t => t.slug)).toEqual(['quadrature-split', 'two-section-quadrature', 'ring-hybrid-feed', 'corporate-divider-1x4', 'beam-matrix-4x4', 'balanced-amplifier'])
    for (const t of TEMPLATES) {
      expect(t.description).not.toMatch(/\n/)
      expect(t.tags.length).toBeGreaterThan(0)
    }
    expect(findTemplate('ring-hybrid-feed')?.name).toBe('Ring-hybrid feed')
    expect(findTemplate('nothing')).toBeUndefined()
  })

  it('builds a fresh document each time, so editing one leaves the template alone', () => {
    const a = TEMPLATES[0]!.build()
    a.blocks[0]!.id = 'Changed'
    expect(TEMPLATES[0]!.build().blocks[0]!.id).not.toBe('Changed')
  })
})

describe('1:4 corporate divider', () => {
  it('gives each output a quarter of the power (−6.02 dB), in phase', () => {
    // Lossless equal four-way split: |S_n1|² = 1/4, i.e. −10·log10(4) = −6.02 dB (Pozar, Microwave Engineering, 4th ed., §7.3, equal-split divider in two ranks).
    const document = findTemplate('corporate-divider-1x4')!.build()
    const solved = solveDocument(document, { sweep: { start: 2.45e9, stop: 2.45e9, points: 1 } })
    if (!solved.ok) throw new Error('not solved')
    const n = solved.result.ports
    for (const out of [2, 3, 4, 5]) {
      const at = (out - 1) * n
      const db = 20 * Math.log10(Math.hypot(solved.result.re[at]!, solved.result.im[at]!))
      expect(db).toBeCloseTo(-6.0206, 3)
    }
  })
})

describe('4×4 beamforming matrix with its array', () => {
  it('steers one beam per input to sin θ = −β/(360°·d)', () => {
    // Uniform linear array, progressive phase β, spacing d wavelengths: the main beam points where
    // 2π·d·sin θ + β = 0 (Balanis, Antenna Theory, 3rd ed., §6.3, eq. 6-10 with ψ = 0).
    // β per input is −45°, +135°, −135°, +45° (each output lags the previous by the matrix's step).
    const template = findTemplate('beam-matrix-4x4')!
    const array = template.array!
    const solved = solveDocument(template.build(), { sweep: { start: 2.45e9, stop: 2.45e9, points: 1 } })
    if (!solved.ok) throw new Error('not solved')
    const beta: Record<number, number> = { 1: -45, 2: 135, 3: -135, 4: 45 }
    for (const input of array.inputs) {
      const figures = beamFigures(beamWeights(solved.result, 0, input, array.outputs), { spacing: array.spacing })
      const expected = Math.asin(-beta[input]! / (360 * array.spacing)) * 180 / Math.PI
      expect(figures.peakDeg).toBeCloseTo(expected, 1)
      // Lossless network feeding four equal, steered elements: peak 10·log10(|AF|²/N) = 0 dB (contract's beams definition).
      expect(figures.peakDb).toBeCloseTo(0, 2)
    }
  })
})
