import { describe, expect, it } from 'vitest'
import { prepareNetwork } from '../../../shared/solver/index'

const base = (blocks: unknown[], wires: Array<[string, string]>, extra: Record<string, unknown> = {}) => ({
  format: 'portwright.network', version: 1, referenceImpedance: 50, variables: { f0: '2.45 GHz', Z0: '50 ohm' }, blocks, wires, ...extra,
})
const p1 = { id: 'P1', type: 'port', params: { index: 1 } }
const line = (params: Record<string, unknown>, id = 'TA') => ({ id, type: 'line', params })
const problemsOf = (input: unknown) => {
  const prepared = prepareNetwork(input)
  expect(prepared.ok).toBe(false)
  return prepared.ok ? [] : prepared.problems
}
const messages = (input: unknown) => problemsOf(input).map(p => p.message)

describe('value errors name the block, the parameter and the reason', () => {
  it('unknown name in an expression', () => {
    const problems = problemsOf(base([p1, line({ impedance: 'Zx/2', degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']]))
    expect(problems).toEqual([{ block: 'TA', field: 'impedance', message: 'block TA (line), impedance: "Zx/2" uses the unknown name Zx' }])
  })

  it('variables in a cycle, and a block that uses one', () => {
    const list = messages(base([p1, line({ impedance: 'a', degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']], { variables: { a: 'b * 2', b: 'a + 1 ohm', f0: '1 GHz' } }))
    expect(list).toContain('variable a: is part of a cycle: a → b → a')
    expect(list).toContain('variable b: is part of a cycle: a → b → a')
    expect(list).toContain('block TA (line), impedance: "a" uses the variable a, which has an error')
  })

  it('wrong unit: an impedance given in GHz', () => {
    expect(messages(base([p1, line({ impedance: '2.45 GHz', degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']])))
      .toEqual(['block TA (line), impedance: "2.45 GHz" is a frequency, but an impedance (Ω) is expected'])
  })

  it('wrong unit through a variable: a frequency where a length is expected', () => {
    expect(messages(base([p1, line({ impedance: 50, length: 'f0' })], [['P1.1', 'TA.1']])))
      .toEqual(['block TA (line), length: "f0" is a frequency, but a length (m) is expected'])
  })

  it('zero and negative impedances', () => {
    expect(messages(base([p1, line({ impedance: 0, degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']])))
      .toEqual(['block TA (line), impedance: must be greater than zero (got 0 Ω)'])
    expect(messages(base([{ id: 'P1', type: 'port', params: { index: 1, impedance: '-50 ohm' } }, line({ impedance: 50, degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']])))
      .toEqual(['block P1 (port), impedance: must be greater than zero (got -50 Ω)'])
    expect(messages(base([p1, line({ impedance: 50, degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']], { referenceImpedance: -5 })))
      .toEqual(['referenceImpedance: must be greater than zero (got -5 Ω)'])
  })

  it('missing, conflicting and unknown parameters', () => {
    expect(messages(base([p1, line({ degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']]))).toEqual(['block TA (line), impedance: is required'])
    expect(messages(base([p1, line({ impedance: 50, degrees: 90 })], [['P1.1', 'TA.1']]))[0]).toMatch(/^block TA \(line\), at: is required with degrees/)
    expect(messages(base([p1, line({ impedance: 50, degrees: 90, at: 'f0', length: 0.01 })], [['P1.1', 'TA.1']]))[0]).toMatch(/^block TA \(line\), length: give the length either as degrees with at, or as length, not both/)
    expect(messages(base([p1, line({ impedence: 50, degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']]))[0]).toMatch(/^block TA \(line\), impedence: is not a parameter of line \(it takes impedance, /)
    expect(messages(base([p1, { id: 'S', type: 'stub', params: { impedance: 50, degrees: 45, at: 'f0', end: 'closed' } }], [['P1.1', 'S.1']])))
      .toEqual(['block S (stub), end: "closed" is not one of open, short'])
    expect(messages(base([p1, { id: 'H', type: 'hybrid90', params: { model: 'branch' } }], [['P1.1', 'H.1']]))[0]).toMatch(/^block H \(hybrid90\), at: is required for the branch model/)
  })

  it('a malformed expression and a structural error', () => {
    expect(messages(base([p1, line({ impedance: '50 +', degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']]))[0]).toMatch(/^block TA \(line\), impedance: "50 \+" cannot be read as an expression/)
    expect(problemsOf(base([p1, line({ impedance: true, degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']])))
      .toEqual([{ block: 'TA', field: 'impedance', message: 'block TA, params.impedance: must be a number or an expression string' }])
    expect(messages({ format: 'portwright.network', version: 2, blocks: [], wires: [] })[0]).toMatch(/^version: /)
    expect(messages('not a document')).toEqual(['a network document must be a JSON object'])
  })

  it('functions that reach beyond arithmetic are refused', () => {
    expect(messages(base([p1, line({ impedance: 'evaluate("50")', degrees: 90, at: 'f0' })], [['P1.1', 'TA.1']]))[0]).toMatch(/^block TA \(line\), impedance: .*uses the function evaluate, which is not available/)
  })
})

describe('topology errors name the culprit', () => {
  const good = line({ impedance: 50, degrees: 90, at: 'f0' })

  it('wire to a missing block or terminal', () => {
    expect(messages(base([p1, good], [['P1.1', 'TA.1'], ['TA.2', 'XX.1']]))).toEqual(['wire 2 (TA.2 – XX.1): there is no block XX'])
    expect(messages(base([p1, good], [['P1.1', 'TA.3']]))).toEqual(['wire 1 (P1.1 – TA.3): block TA (line) has terminals 1–2, so TA.3 does not exist'])
    expect(messages(base([p1, good], [['P1.1', 'TA']]))).toEqual(['wire 1 (P1.1 – TA): "TA" is not a terminal; write BLOCK.N, e.g. TA.1'])
  })

  it('duplicate, missing and gapped port indices', () => {
    const p = (id: string, index: number) => ({ id, type: 'port', params: { index } })
    expect(messages(base([p('A', 1), p('B', 1), good], [['A.1', 'TA.1'], ['B.1', 'TA.2']]))).toEqual(['port B, index: 1 is also used by port A'])
    expect(messages(base([p('A', 1), p('B', 3), good], [['A.1', 'TA.1'], ['B.1', 'TA.2']]))).toEqual(['port indices must run from 1 to 3 without gaps: 2 is missing'])
    expect(messages(base([good], []))).toEqual(['the network has no ports: add at least one port block'])
    expect(messages(base([p('A', 1.5), good], [['A.1', 'TA.1']]))).toEqual(['block A (port), index: must be a whole number (got 1.5)'])
  })

  it('port on no wire', () => {
    expect(messages(base([p1, { id: 'P2', type: 'port', params: { index: 2 } }, good], [['P1.1', 'TA.1']]))).toEqual(['port P2 is on no wire'])
  })

  it('unknown block type, and types of a later version', () => {
    expect(messages(base([p1, { id: 'Q', type: 'resonator', params: {} }], [['P1.1', 'Q.1']]))[0]).toMatch(/^block Q: unknown block type "resonator" \(known types: port, line, /)
    expect(messages(base([p1, { id: 'D', type: 'data', params: { file: 'x.s2p' } }], [['P1.1', 'D.1']]))).toEqual(['block D (data), file: data set "x.s2p" cannot be loaded here (no data loader was given)'])
    // A microstrip is solved now; without the substrate it names, the problem says so.
    expect(messages(base([p1, { id: 'M', type: 'microstrip', params: { substrate: 'core', width: '1 mm', length: '10 mm' } }], [['P1.1', 'M.1']]))).toEqual(['block M (microstrip), substrate: "core" names no substrate: the document has none; add one under substrates'])
  })

  it('duplicate block ids', () => {
    expect(messages(base([p1, good, good], [['P1.1', 'TA.1']]))).toEqual(['block id TA is used by more than one block'])
  })
})

describe('evaluated values are reported even when the document fails', () => {
  it('fills display values and errors per field', () => {
    const prepared = prepareNetwork(base([p1, line({ impedance: 'Z0/sqrt(2)', degrees: 90, at: 'f0' }), line({ impedance: '3 GHz', degrees: 90, at: 'f0' }, 'TB')], [['P1.1', 'TA.1']]))
    expect(prepared.ok).toBe(false)
    expect(prepared.evaluated.blocks.TA!.impedance).toEqual({ value: 50 / Math.SQRT2, unit: 'Ω', display: '35.36 Ω' })
    expect(prepared.evaluated.blocks.TA!.at!.display).toBe('2.45 GHz')
    expect(prepared.evaluated.blocks.TB!.impedance!.error).toBe('"3 GHz" is a frequency, but an impedance (Ω) is expected')
    expect(prepared.evaluated.variables.Z0).toEqual({ value: 50, unit: 'Ω', display: '50 Ω' })
    expect(prepared.evaluated.settings.referenceImpedance!.display).toBe('50 Ω')
  })
})
