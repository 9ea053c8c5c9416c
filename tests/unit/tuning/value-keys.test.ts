import { describe, expect, it } from 'vitest'
import { branchLineTuning } from '../../../shared/examples/index'
import { applyValues, prepareTuning, resolveTolerances, resolveTunables, type TuningSetup } from '../../../shared/tuning/index'
import type { NetworkDocument } from '../../../shared/network/types'
import { solveAt, s } from '../solver/helpers'

function setupOf(document: NetworkDocument): TuningSetup {
  const prepared = prepareTuning(document)
  if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
  return prepared.setup
}

describe('values by KEY', () => {
  it('names each key that does not name a block parameter or variable, and why', () => {
    const document = branchLineTuning(false)
    document.tunables = {
      'NOPE.impedance': { min: 1, max: 2 },
      'T12.width': { min: 1, max: 2 },
      'P1.index': { min: 1, max: 2 },
      'f1': { min: 1, max: 2 },
    }
    const resolved = resolveTunables(setupOf(document))
    expect(resolved.ok).toBe(false)
    if (resolved.ok) return
    expect(resolved.problems.map(p => p.message)).toEqual([
      'tunables.NOPE.impedance: no block is called "NOPE"',
      expect.stringMatching(/^tunables\.T12\.width: block T12 \(line\) has no parameter "width" \(it takes .*impedance.*\)$/),
      'tunables.P1.index: index of block P1 is not a value that can be varied',
      'tunables.f1: no variable is called "f1" (a key is a variable name or BLOCK.param, e.g. T1.impedance)',
    ])
  })

  it('reads ranges and absolute tolerances with units in the key\'s unit, and names a wrong unit or an empty range', () => {
    const document = branchLineTuning(false)
    document.tunables = { 'T12.impedance': { min: '30 ohm', max: 40 }, 'f0': { min: '2.4 GHz', max: '2.5 GHz' }, 'BR14.degrees': { min: '3 mm', max: 100 }, 'BR23.impedance': { min: 60, max: 40 } }
    const bad = resolveTunables(setupOf(document))
    expect(bad.ok).toBe(false)
    if (!bad.ok) {
      expect(bad.problems.map(p => p.message)).toEqual([
        expect.stringMatching(/^tunables\.BR14\.degrees\.min: "3 mm" is a length, but an angle/),
        'tunables.BR23.impedance: max (40 Ω) must be above min (60 Ω)',
      ])
    }
    delete document.tunables['BR14.degrees']
    delete document.tunables['BR23.impedance']
    const good = resolveTunables(setupOf(document))
    expect(good.ok && good.ranges.map(r => [r.target.key, r.min, r.max, r.target.nominal])).toEqual([
      ['T12.impedance', 30, 40, 50 / Math.SQRT2],
      ['f0', 2.4e9, 2.5e9, 2.45e9],
    ])
    document.tolerances = { 'Z0': { absolute: '2 GHz' } }
    const tolerance = resolveTolerances(setupOf(document))
    expect(!tolerance.ok && tolerance.problems[0]!.message).toBe('tolerances.Z0.absolute: "2 GHz" is not in the unit of Z0 (ohm)')
  })

  it('writes numbers into block parameters and "value unit" into variables, leaving the input untouched', () => {
    const document = branchLineTuning(false)
    const before = JSON.stringify(document)
    document.tunables = { 'T12.impedance': { min: 30, max: 40 }, 'Z0': { min: '40 ohm', max: '60 ohm' } }
    const resolved = resolveTunables(setupOf(document))
    if (!resolved.ok) throw new Error('tunables did not resolve')
    const changed = applyValues(document, resolved.ranges.map(r => r.target), [35, 55])
    expect(changed.blocks.find(b => b.id === 'T12')!.params.impedance).toBe(35)
    expect(changed.variables!.Z0).toBe('55 ohm')
    expect(JSON.stringify({ ...document, tunables: undefined })).toBe(JSON.stringify({ ...JSON.parse(before), tunables: undefined }))
    // The variable keeps its dimension, so the arms written "Z0" now take 55 Ω and the match at port 1 moves.
    const a = solveAt(document, [2.45e9]), b = solveAt(changed, [2.45e9])
    expect(s(b, 1, 1)).not.toEqual(s(a, 1, 1))
  })
})
