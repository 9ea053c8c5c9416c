// Values come from other people's documents; only allow-listed constructs are evaluated (OWASP ASVS 5.0, V2:
// validation by allow-list). Each refused construct names its attack.
import { describe, expect, it } from 'vitest'
import { evaluateQuantity, evaluateVariableValue } from '../../../shared/network/expression'
import { evaluateVariables } from '../../../shared/network/variables'

const scope = new Map<string, number>([['n', 4]])
const refused = (text: string) => {
  const outcome = evaluateQuantity(text, 'ratio', scope)
  expect(outcome.ok, text).toBe(false)
  return outcome.ok ? '' : outcome.error
}

describe('expressions: the allow-list', () => {
  it('attack: config() changes the shared maths instance for every later evaluation', () => {
    expect(refused('config({"number": "Fraction"})')).toMatch(/uses the function config, which is not available/)
    // The same attempt as a variable; afterwards numbers are still plain numbers.
    const v = evaluateVariables({ poison: 'config({"number": "BigNumber"})', x: '1/3' })
    expect(v.evaluated.poison?.error).toMatch(/config/)
    expect(evaluateQuantity('1/3', 'ratio', scope)).toEqual({ ok: true, value: 1 / 3 })
  })

  it('attack: a huge matrix costs seconds or the heap (ones, zeros, matrix literals, ranges)', () => {
    expect(refused('sum(ones(3000,3000))')).toMatch(/uses the function sum, which is not available/)
    expect(refused('ones(20000, 20000)')).toMatch(/function ones/)
    expect(refused('[1, 2, 3]')).toMatch(/uses a matrix or list, which is not allowed/)
    expect(refused('1:100000000')).toMatch(/uses a range/)
  })

  it('attack: definitions, assignments, strings, objects and indexing', () => {
    expect(refused('f(x) = x')).toMatch(/uses a function definition/)
    expect(refused('n = 5')).toMatch(/uses an assignment/)
    expect(refused('"50"')).toMatch(/uses text in quotes/)
    expect(refused('{a: 1}')).toMatch(/uses an object/)
    expect(refused('n[1]')).toMatch(/indexing/)
    expect(refused('1; 2')).toMatch(/several statements/)
    expect(refused('import({}, {})')).toMatch(/function import/)
    expect(refused('evaluate("1")')).toMatch(/function evaluate/)
    expect(refused('n > 1 ? 2 : 3')).toMatch(/a condition/)
    expect(refused('5!')).toMatch(/operator !/)
  })

  it('attack: reaching a function without calling it (a bare name)', () => {
    expect(refused('config')).toMatch(/uses the name config, which is a function/)
    expect(refused('sqrt + 1')).toMatch(/uses the name sqrt, which is a function/)
  })

  it('attack: very long or deeply nested expressions are refused before they cost anything', () => {
    expect(refused('1+'.repeat(300) + '1')).toMatch(/too long \(500 characters at most\)/)
    expect(refused(Array.from({ length: 120 }, () => 'n').join('+'))).toMatch(/too complex \(more than 200 terms\)/)
  })

  it('allowed functions give their textbook values', () => {
    // Identities of the elementary functions (Abramowitz & Stegun, Handbook of Mathematical Functions, ch. 4).
    const value = (text: string) => {
      const o = evaluateQuantity(text, 'ratio', scope)
      expect(o.ok, text).toBe(true)
      return o.ok ? o.value : NaN
    }
    expect(value('sqrt(2)^2')).toBeCloseTo(2, 14)
    expect(value('cbrt(27)')).toBeCloseTo(3, 14)
    expect(value('ln(e)')).toBeCloseTo(1, 14)
    expect(value('log(e^2)')).toBeCloseTo(2, 14)
    expect(value('log10(1000) + log2(8)')).toBeCloseTo(6, 14)
    expect(value('sin(pi/6)')).toBeCloseTo(0.5, 14)
    expect(value('cos(60 deg)')).toBeCloseTo(0.5, 14)
    expect(value('atan2(1, 1) * 4')).toBeCloseTo(Math.PI, 14)
    expect(value('cosh(1)^2 - sinh(1)^2')).toBeCloseTo(1, 12)
    expect(value('hypot(3, 4) + min(1, n) + max(2, 3) + abs(-1) + sign(-2)')).toBeCloseTo(5 + 1 + 3 + 1 - 1, 14)
    expect(value('round(2.5) + floor(1.7) + ceil(1.2) + pow(2, 10)')).toBe(3 + 1 + 2 + 1024)
    expect(value('7 % 4')).toBe(3)
    // Decibel conversions (common practice): 3.0103 dB is a power ratio of 2; 20 dB an amplitude ratio of 10.
    expect(value('fromDbPower(10*log10(2))')).toBeCloseTo(2, 12)
    expect(value('fromDbAmplitude(20)')).toBeCloseTo(10, 12)
    expect(value('toDbPower(2)')).toBeCloseTo(3.0103, 4)
    expect(value('toDbAmplitude(10)')).toBeCloseTo(20, 12)
  })

  it('units, variables and comparisons still work', () => {
    expect(evaluateQuantity('2.45 GHz', 'frequency', scope)).toEqual({ ok: true, value: 2.45e9 })
    expect(evaluateQuantity('50 ohm / sqrt(2)', 'impedance', scope)).toEqual({ ok: true, value: 50 / Math.SQRT2 })
    const quarter = evaluateQuantity('299792458 m/s / (2.45 GHz) / n', 'length', scope)
    expect(quarter.ok && quarter.value).toBeCloseTo(299792458 / 2.45e9 / 4, 12)
    expect(evaluateVariableValue('1 < 2', new Map())).toEqual({ ok: false, error: '"1 < 2" does not give a number' })
  })
})
