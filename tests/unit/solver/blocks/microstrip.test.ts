import { describe, expect, it } from 'vitest'
import { analyseMicrostrip } from '../../../../shared/microstrip/analyse-microstrip'
import { C0, DB_PER_NEPER } from '../../../../shared/microstrip/constants'
import { synthesiseWidth } from '../../../../shared/microstrip/synthesise-width'
import { prepareNetwork, solveNetwork } from '../../../../shared/solver/index'
import { abs, doc, gram, largestSingularValue, matrix, maxDiff, port, s, solveAt } from '../helpers'

const core = { permittivity: 3.5, height: '0.5 mm', thickness: '35 um', lossTangent: 0.003, conductivity: 5.8e7 }
const lossless = { permittivity: 3.5, height: '0.5 mm' }
const SUBSTRATE = { permittivity: 3.5, height: 0.5e-3, thickness: 0, lossTangent: 0, roughness: 0 }
const ms = (params: Record<string, unknown>, id = 'MS') => ({ id, type: 'microstrip', params: { substrate: 'core', ...params } })
const twoPort = (block: unknown, substrates: Record<string, unknown>, extra: Record<string, unknown> = {}) =>
  doc([port(1), port(2), block], [['P1.1', 'MS.1'], ['MS.2', 'P2.1']], { version: 1, substrates, ...extra })

describe('microstrip block', () => {
  it('is a lossless line of Z0(f) and ε_eff(f): matched when Z0(f) equals the reference, phase −β·l', () => {
    // Identity of a matched TEM line (Pozar, Microwave Engineering, 4th ed., §2.? [common practice]): S11 = 0, S21 = e^(−jβl).
    const f = 2.45e9
    const found = synthesiseWidth(SUBSTRATE, 50, f)
    if (!found.ok) throw new Error(found.message)
    const result = solveAt(twoPort(ms({ width: found.width, length: '23 mm' }), { core: lossless }), [f])
    const epsEff = analyseMicrostrip(SUBSTRATE, found.width, f).epsEff
    const beta = (2 * Math.PI * f * Math.sqrt(epsEff)) / C0
    expect(abs(s(result, 1, 1))).toBeLessThan(1e-9)
    expect(s(result, 2, 1)[0]).toBeCloseTo(Math.cos(beta * 0.023), 9)
    expect(s(result, 2, 1)[1]).toBeCloseTo(-Math.sin(beta * 0.023), 9)
  })

  it('equals an ideal line block of the same impedance and electrical length at that frequency', () => {
    const f = 6e9, width = 0.4e-3, length = 0.0123
    const line = analyseMicrostrip(SUBSTRATE, width, f)
    const degrees = (360 * f * Math.sqrt(line.epsEff) * length) / C0
    const a = solveAt(twoPort(ms({ width, length }), { core: lossless }), [f])
    const b = solveAt(doc([port(1), port(2), { id: 'MS', type: 'line', params: { impedance: line.impedance, degrees, at: f } }], [['P1.1', 'MS.1'], ['MS.2', 'P2.1']]), [f])
    expect(maxDiff(matrix(a), matrix(b))).toBeLessThan(1e-12)
  })

  it('with losses: reciprocal, passive, and a matched line loses α·l (dB = 8.686·α·l)', () => {
    const f = 10e9
    const substrate = { ...SUBSTRATE, thickness: 35e-6, lossTangent: 0.003, conductivity: 5.8e7 }
    const found = synthesiseWidth(substrate, 50, f)
    if (!found.ok) throw new Error(found.message)
    const result = solveAt(twoPort(ms({ width: found.width, length: '50 mm' }), { core }), [1e9, 5e9, f])
    for (let k = 0; k < 3; k++) {
      const m = matrix(result, k)
      expect(maxDiff(m, m.map((row, i) => row.map((_, j) => m[j]![i]!)))).toBeLessThan(1e-14)
      expect(largestSingularValue(m)).toBeLessThan(1)
    }
    const line = analyseMicrostrip(substrate, found.width, f)
    expect(-20 * Math.log10(abs(s(result, 2, 1, 2)))).toBeCloseTo(DB_PER_NEPER * (line.conductorLoss + line.dielectricLoss) * 0.05, 9)
  })

  it('lossless: SᴴS = I; zero length: a through connection', () => {
    const result = solveAt(twoPort(ms({ width: '0.3 mm', length: '17 mm' }), { core: lossless }), [3e9, 18e9])
    for (let k = 0; k < 2; k++) {
      const g = gram(matrix(result, k))
      expect(maxDiff(g, [[[1, 0], [0, 0]], [[0, 0], [1, 0]]])).toBeLessThan(1e-12)
    }
    const through = solveAt(twoPort(ms({ width: '0.3 mm', length: 0 }), { core: lossless }), [3e9])
    expect(maxDiff(matrix(through), [[[0, 0], [1, 0]], [[1, 0], [0, 0]]])).toBeLessThan(1e-15)
  })

  it('takes substrate values from variables; an unknown substrate names the block and lists the substrates', () => {
    const withVariable = twoPort(ms({ width: '1 mm', length: '10 mm' }), { core: { permittivity: 'er', height: 'h' } }, { variables: { er: 3.5, h: '0.5 mm' } })
    expect(prepareNetwork(withVariable).ok).toBe(true)
    const unknown = prepareNetwork(twoPort(ms({ substrate: 'rogue', width: '1 mm', length: '10 mm' }), { core, thin: lossless }))
    expect(unknown.ok).toBe(false)
    if (!unknown.ok) expect(unknown.problems.map(p => p.message)).toEqual(['block MS (microstrip), substrate: "rogue" is not one of the document\'s substrates (core, thin)'])
    const broken = prepareNetwork(twoPort(ms({ width: '1 mm', length: '10 mm' }), { core: { permittivity: 0.5, height: '3 GHz' } }))
    expect(broken.ok).toBe(false)
    if (!broken.ok) {
      expect(broken.problems.map(p => p.message)).toEqual([
        'substrate core, permittivity: must be at least 1 (got 0.5)',
        expect.stringMatching(/^substrate core, height: "3 GHz" is a frequency/),
        'block MS (microstrip), substrate: substrate "core" has errors (see substrates.core)',
      ])
      expect(broken.evaluated.settings['substrates.core.permittivity']?.error).toMatch(/at least 1/)
    }
  })

  it('warns, naming the block, when used outside the models\' ranges; frequency notes only when the sweep goes there', () => {
    const narrow = prepareNetwork(twoPort(ms({ width: '1 um', length: '10 mm' }), { core }))
    if (!narrow.ok) throw new Error(narrow.problems[0]!.message)
    const low = solveNetwork(narrow.network, Float64Array.of(1e9))
    expect(low.ok && low.warnings.map(w => w.message)).toEqual([
      'block MS (microstrip), width: W/h = 0.002 is outside 0.01…100, the range of the Hammerstad–Jensen static model',
      'block MS (microstrip), width: W/h = 0.002 is outside 0.1…100, the range of the Kirschning–Jansen dispersion model',
    ])
    const fine = prepareNetwork(twoPort(ms({ width: '1 mm', length: '10 mm' }), { core }))
    if (!fine.ok) throw new Error(fine.problems[0]!.message)
    const inRange = solveNetwork(fine.network, Float64Array.of(1e9, 20e9))
    expect(inRange.ok && inRange.warnings).toEqual([])
    // 15 GHz·mm / 0.5 mm = 30 GHz (derived by hand from the stated range of Jansen & Kirschning 1983).
    const high = solveNetwork(fine.network, Float64Array.of(1e9, 40e9))
    expect(high.ok && high.warnings.map(w => w.message)).toEqual(['block MS (microstrip), frequency: above 30 GHz (f·h > 15 GHz·mm) the Jansen–Kirschning frequency-dependent impedance is extrapolated'])
    expect(high.ok && high.warnings[0]!.block).toBe('MS')
  })
})

describe('microstrip warnings inside a subnetwork', () => {
  it('reach the solve through the subnetwork block, saying where they come from', () => {
    const inner = twoPort(ms({ width: '1 um', length: '10 mm' }), { core })
    const outer = doc([port(1), port(2), { id: 'S', type: 'subnetwork', params: { network: 'inner' } }], [['P1.1', 'S.1'], ['S.2', 'P2.1']])
    const prepared = prepareNetwork(outer, { resolveSubnetwork: ref => (ref === 'inner' ? inner : undefined) })
    if (!prepared.ok) throw new Error(prepared.problems[0]!.message)
    const solved = solveNetwork(prepared.network, Float64Array.of(1e9))
    expect(solved.ok && solved.warnings.map(w => w.message)[0]).toBe(
      'block S (subnetwork): in network "inner": block MS (microstrip), width: W/h = 0.002 is outside 0.01…100, the range of the Hammerstad–Jensen static model',
    )
    expect(solved.ok && solved.warnings[0]!.block).toBe('S')
  })
})

describe('a branch-line hybrid of microstrips', () => {
  it('sized at f0 by synthesis, it is the ideal quadrature hybrid at f0 (Pozar, Microwave Engineering, 4th ed., §7.5)', () => {
    // Pozar §7.5: S = −(1/√2)[[0, j, 1, 0], [j, 0, 0, 1], [1, 0, 0, j], [0, 1, j, 0]] at f0, arms of Z0/√2 and Z0, a quarter wave each.
    const f0 = 2.45e9
    const arm = (impedance: number) => {
      const found = synthesiseWidth(SUBSTRATE, impedance, f0)
      if (!found.ok) throw new Error(found.message)
      const epsEff = analyseMicrostrip(SUBSTRATE, found.width, f0).epsEff
      return { substrate: 'core', width: found.width, length: C0 / (f0 * Math.sqrt(epsEff)) / 4 }
    }
    const through = arm(50 / Math.SQRT2), branch = arm(50)
    const blocks = [port(1), port(2), port(3), port(4),
      { id: 'A', type: 'microstrip', params: through }, { id: 'B', type: 'microstrip', params: through },
      { id: 'C', type: 'microstrip', params: branch }, { id: 'D', type: 'microstrip', params: branch }]
    const wires: Array<[string, string]> = [['P1.1', 'A.1'], ['A.2', 'P2.1'], ['P4.1', 'B.1'], ['B.2', 'P3.1'], ['P1.1', 'C.1'], ['C.2', 'P4.1'], ['P2.1', 'D.1'], ['D.2', 'P3.1']]
    const result = solveAt(doc(blocks, wires, { substrates: { core: lossless } }), [f0])
    const k = -Math.SQRT1_2
    const ideal: Array<Array<[number, number]>> = [
      [[0, 0], [0, k], [k, 0], [0, 0]],
      [[0, k], [0, 0], [0, 0], [k, 0]],
      [[k, 0], [0, 0], [0, 0], [0, k]],
      [[0, 0], [k, 0], [0, k], [0, 0]],
    ]
    expect(maxDiff(matrix(result), ideal)).toBeLessThan(1e-9)
  })
})
