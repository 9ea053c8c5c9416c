import { describe, expect, it } from 'vitest'
import { clipToRange, dbAxisRange, delayAxisRange, responseAxisRange, vswrAxisRange } from '../../../app/utils/editor/plotRange'

// Axis choices are common practice for network-analyser style displays (a top on a 10 dB
// grid line, a limited dynamic range below it); the numbers below are worked by hand.

describe('dB axis', () => {
  it('keeps an ideal match (−317 dB) from flattening the other traces', () => {
    // The branch-line hybrid at its centre: S21, S31 at −3.01 dB, S11 and S41 at the floating-point floor.
    const s21 = [-3.2, -3.01, -3.2]
    const s11 = [-25, -317.5, -25]
    const range = dbAxisRange([s21, s11])
    expect(range).toEqual({ min: -80, max: 0 })
  })

  it('rounds the top up and the bottom down to the 10 dB grid when the data span less than the floor', () => {
    expect(dbAxisRange([[-12.5, -3.2], [-41]])).toEqual({ min: -50, max: 0 })
    expect(dbAxisRange([[2.5, 7]])).toEqual({ min: 0, max: 10 })
  })

  it('gives a flat trace one grid step of height', () => {
    expect(dbAxisRange([[-20, -20]])).toEqual({ min: -30, max: -20 })
  })

  it('treats −∞ dB (|S| = 0 exactly) as below the floor and ignores NaN', () => {
    expect(dbAxisRange([[-Infinity, -6, Number.NaN]])).toEqual({ min: -10, max: 0 })
  })

  it('takes a user range, either end alone, and falls back when it is inverted', () => {
    expect(dbAxisRange([[-3, -317]], { user: { min: -40, max: 5 } })).toEqual({ min: -40, max: 5 })
    expect(dbAxisRange([[-3, -317]], { user: { min: -120 } })).toEqual({ min: -120, max: 0 })
    expect(dbAxisRange([[-3, -317]], { user: { min: 10, max: -10 } })).toEqual({ min: -80, max: 0 })
  })

  it('has a range even with nothing to show', () => {
    const range = dbAxisRange([])
    expect(range.max).toBeGreaterThan(range.min)
  })
})

describe('VSWR axis', () => {
  it('caps at 10 (a return loss of 1.74 dB) so a total reflection does not squash a good match', () => {
    // VSWR = (1 + |Γ|)/(1 − |Γ|) (Pozar, Microwave Engineering, 4th ed., eq. 2.41): |Γ| = 1 gives +∞.
    expect(vswrAxisRange([[1.02, 1.3, Infinity]])).toEqual({ min: 1, max: 10 })
    expect(vswrAxisRange([[1.02, 1.3, 250]])).toEqual({ min: 1, max: 10 })
  })

  it('rounds a modest top up to a whole number, at least 2', () => {
    expect(vswrAxisRange([[1.01, 1.08]])).toEqual({ min: 1, max: 2 })
    expect(vswrAxisRange([[1.2, 3.4]])).toEqual({ min: 1, max: 4 })
  })
})

describe('group delay axis', () => {
  it('clips a spike at a transmission zero but shows a smooth curve whole', () => {
    const smooth = Array.from({ length: 101 }, (_, k) => 1e-9 + 2e-11 * k)
    const whole = delayAxisRange([smooth])
    expect(whole.min).toBeLessThanOrEqual(1e-9)
    expect(whole.max).toBeGreaterThanOrEqual(3e-9)
    expect(whole.max).toBeLessThan(3.2e-9)

    const spiky = [...smooth]
    spiky[50] = 4e-6 // a thousand times the passband delay
    const clipped = delayAxisRange([spiky])
    expect(clipped.max).toBeLessThan(5e-9)
    expect(clipped.min).toBeLessThanOrEqual(1e-9)
  })
})

describe('responseAxisRange', () => {
  it('leaves phase to autoscale unless the user sets an end', () => {
    expect(responseAxisRange('phase', [[-180, 180]])).toBeNull()
    expect(responseAxisRange('unwrapped', [[-900, 0]], { min: -360 })).toEqual({ min: -360, max: 0 })
  })
  it('picks the dB rule for magnitude', () => {
    expect(responseAxisRange('db', [[-3, -300]])).toEqual({ min: -80, max: 0 })
  })
})

describe('clipToRange', () => {
  it('puts values beyond the axis on its edge and keeps NaN as a gap', () => {
    expect(Array.from(clipToRange([-317.5, -3.01, Number.NaN, -Infinity, 12, null], { min: -80, max: 0 }))).toEqual([-80, -3.01, Number.NaN, -80, 0, Number.NaN])
  })
})
