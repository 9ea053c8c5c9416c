import { describe, expect, it } from 'vitest'
import { evaluateQuantity } from '../../../shared/network/expression'
import { formatQuantity } from '../../../shared/network/format-quantity'
import { evaluateVariables } from '../../../shared/network/variables'

describe('expressions with units', () => {
  const { scope, failed, problems } = evaluateVariables({ f0: '2.45 GHz', Z0: '50 ohm', Zt: 'Z0 / sqrt(2)', lambda: '299792458 m/s / f0', n: 4 })

  it('variables use each other in any order', () => {
    expect(problems).toEqual([])
    expect(evaluateQuantity('Zt', 'impedance', scope, failed)).toEqual({ ok: true, value: 50 / Math.SQRT2 })
    // λ = c0/f (common practice): 122.36 mm at 2.45 GHz.
    const quarter = evaluateQuantity('lambda / n', 'length', scope, failed)
    expect(quarter.ok && quarter.value).toBeCloseTo(299792458 / 2.45e9 / 4, 12)
  })

  it('numbers are SI; units and prefixes convert', () => {
    expect(evaluateQuantity(3e-12, 'capacitance', scope)).toEqual({ ok: true, value: 3e-12 })
    expect(evaluateQuantity('3 pF', 'capacitance', scope)).toEqual({ ok: true, value: 3e-12 })
    expect(evaluateQuantity('1.6 mm', 'length', scope)).toEqual({ ok: true, value: 0.0016 })
    expect(evaluateQuantity('4.7 kΩ', 'resistance', scope)).toEqual({ ok: true, value: 4700 })
    expect(evaluateQuantity('10 nH', 'inductance', scope).ok).toBe(true)
    expect(evaluateQuantity('90 deg', 'angle', scope)).toEqual({ ok: true, value: 90 })
    expect(evaluateQuantity('3 dB', 'decibel', scope)).toEqual({ ok: true, value: 3 })
  })

  it('a wrong dimension names both sides', () => {
    expect(evaluateQuantity('f0', 'impedance', scope)).toEqual({ ok: false, error: '"f0" is a frequency, but an impedance (Ω) is expected' })
    expect(evaluateQuantity('2 W', 'frequency', scope)).toEqual({ ok: false, error: '"2 W" is a power, but a frequency (Hz) is expected' })
    expect(evaluateQuantity('Z0', 'decibel', scope)).toEqual({ ok: false, error: '"Z0" is an impedance, but a number of decibels is expected' })
    expect(evaluateQuantity('sqrt(-1)', 'ratio', scope)).toEqual({ ok: false, error: '"sqrt(-1)" is a complex number; a real value is expected' })
  })

  it('a variable with an unknown name fails alone and taints its users', () => {
    const v = evaluateVariables({ a: 'q + 1', b: 'a * 2', c: 5, '2x': 1 })
    expect(v.evaluated.a).toEqual({ error: '"q + 1" uses the unknown name q' })
    expect(v.evaluated.b).toEqual({ error: 'uses the variable a, which has an error' })
    expect(v.evaluated.c).toEqual({ value: 5, display: '5' })
    expect(v.evaluated['2x']!.error).toMatch(/not a valid variable name/)
    expect(v.problems.map(p => p.field)).toEqual(['variables.a', 'variables.b', 'variables.2x'])
  })
})

describe('display of quantities', () => {
  it('uses engineering prefixes and four significant digits', () => {
    expect(formatQuantity(50 / Math.SQRT2, 'impedance')).toBe('35.36 Ω')
    expect(formatQuantity(2.45e9, 'frequency')).toBe('2.45 GHz')
    expect(formatQuantity(0.0005, 'length')).toBe('500 µm')
    expect(formatQuantity(3e-12, 'capacitance')).toBe('3 pF')
    expect(formatQuantity(90, 'angle')).toBe('90°')
    expect(formatQuantity(3.0103, 'decibel')).toBe('3.01 dB')
    expect(formatQuantity(0, 'impedance')).toBe('0 Ω')
  })
})

describe('parsed expressions kept between evaluations', () => {
  it('evaluates a kept expression against each scope it is given', () => {
    // One text, two scopes: the kept parse must not keep the first scope's value.
    const first = evaluateQuantity('2 * Za', 'impedance', new Map([['Za', 20]]))
    const second = evaluateQuantity('2 * Za', 'impedance', new Map([['Za', 31]]))
    expect(first).toEqual({ ok: true, value: 40 })
    expect(second).toEqual({ ok: true, value: 62 })
  })

  it('gives the same answer for a refused or unreadable text every time', () => {
    const unreadable = evaluateQuantity('3 +* 4', 'impedance', new Map())
    expect(evaluateQuantity('3 +* 4', 'impedance', new Map())).toEqual(unreadable)
    expect(unreadable.ok).toBe(false)
    const unknown = evaluateQuantity('Zq', 'impedance', new Map())
    expect(unknown).toEqual({ ok: false, error: '"Zq" uses the unknown name Zq' })
    expect(evaluateQuantity('Zq', 'impedance', new Map([['Zq', 75]]))).toEqual({ ok: true, value: 75 })
  })

  it('still refuses a text over the length limit, without keeping it', () => {
    const long = `${'1+'.repeat(400)}1`
    const outcome = evaluateQuantity(long, 'impedance', new Map())
    expect(outcome.ok).toBe(false)
    expect(outcome.ok ? '' : outcome.error).toContain('too long')
  })
})
