// Option-line rules of the Touchstone File Format Specification, Version 2.0 (IBIS Open Forum, 2009),
// section "Option Line", which also states the version 1 rules. Section titles [memory].
import { describe, expect, it } from 'vitest'
import { parseOptionLine } from '../../../shared/touchstone/option-line'
import { TouchstoneError } from '../../../shared/touchstone/error'
import { failure, near, polar, read, s } from './helpers'

describe('option line (Touchstone 2.0, "Option Line")', () => {
  it('defaults are GHZ S MA R 50 when every option is omitted ("#" alone)', () => {
    expect(parseOptionLine('#', 1)).toEqual({ unit: 'GHZ', parameter: 'S', format: 'MA', resistance: 50 })
  })

  it('defaults also apply when the option line is missing altogether (version 1 file)', () => {
    const file = read(['1 0.5 90'])
    expect(file.options).toEqual({ unit: 'GHZ', parameter: 'S', format: 'MA', resistance: 50 })
    expect(file.frequencies[0]).toBe(1e9)
    near(s(file, 0, 1, 1), polar(0.5, 90))
  })

  it('options are read in any order and in any case', () => {
    const expected = { unit: 'KHZ', parameter: 'Y', format: 'RI', resistance: 75 }
    for (const text of ['# KHZ Y RI R 75', '# r 75 ri y khz', '#RI R 75 KHz Y', '#  khz\tY  Ri r  75']) {
      expect(parseOptionLine(text, 1)).toEqual(expected)
    }
  })

  it('each omitted option keeps its own default', () => {
    expect(parseOptionLine('# MHZ', 1)).toEqual({ unit: 'MHZ', parameter: 'S', format: 'MA', resistance: 50 })
    expect(parseOptionLine('# Z', 1)).toEqual({ unit: 'GHZ', parameter: 'Z', format: 'MA', resistance: 50 })
    expect(parseOptionLine('# DB', 1)).toEqual({ unit: 'GHZ', parameter: 'S', format: 'DB', resistance: 50 })
    expect(parseOptionLine('# R 25', 1)).toEqual({ unit: 'GHZ', parameter: 'S', format: 'MA', resistance: 25 })
    expect(parseOptionLine('# HZ H', 1)).toEqual({ unit: 'HZ', parameter: 'H', format: 'MA', resistance: 50 })
    expect(parseOptionLine('# G RI', 1)).toEqual({ unit: 'GHZ', parameter: 'G', format: 'RI', resistance: 50 })
  })

  it('the frequency unit scales every frequency to hertz', () => {
    for (const [unit, scale] of [['HZ', 1], ['KHZ', 1e3], ['MHZ', 1e6], ['GHZ', 1e9]] as const) {
      expect(read([`# ${unit} S RI R 50`, '2.5 0.1 0'], 1).frequencies[0]).toBe(2.5 * scale)
    }
  })

  it('refuses unknown options, a repeated option, R without a value and a resistance that is not positive', () => {
    const reason = (text: string) => {
      try { parseOptionLine(text, 4) } catch (error) { expect(error).toBeInstanceOf(TouchstoneError); return (error as TouchstoneError).reason }
      throw new Error('expected a refusal')
    }
    expect(reason('# GHZ S XY R 50')).toMatch(/"XY" is not an option/)
    expect(reason('# GHZ MHZ')).toMatch(/frequency unit twice/)
    expect(reason('# GHZ S MA R')).toMatch(/R on the option line must be followed/)
    expect(reason('# R 0')).toMatch(/greater than zero/)
    expect(reason('# R -50')).toMatch(/greater than zero/)
    expect(reason('# R abc')).toMatch(/"abc" is not a reference resistance/)
  })

  it('a file has one option line; the line of the second is given', () => {
    const error = failure(['# GHZ S RI R 50', '! note', '# MHZ S RI R 50', '1 0 0'])
    expect(error.line).toBe(3)
    expect(error.reason).toMatch(/second option line \(the first is on line 1\)/)
  })
})
