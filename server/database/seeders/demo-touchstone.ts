import { writeTouchstone, type TouchstoneData } from '../../../shared/touchstone/write'

/**
 * Invented "measured" parts of the demo lab, generated from simple models and written as
 * Touchstone files. The values are made up for the demo; no real part behaves exactly so.
 */

/** Frequencies from `start` to `stop` (Hz), `points` evenly spaced. */
function band(start: number, stop: number, points: number): Float64Array {
  return Float64Array.from({ length: points }, (_, k) => start + ((stop - start) * k) / (points - 1))
}

/** A two-port data set from a function giving S11, S21, S12, S22 as [re, im] pairs at each frequency. */
function twoPort(frequencies: Float64Array, s: (f: number) => [number, number][]): TouchstoneData {
  const re = new Float64Array(frequencies.length * 4)
  const im = new Float64Array(frequencies.length * 4)
  frequencies.forEach((f, k) => {
    // Solver layout: row-major S11 S12 S21 S22.
    const [s11, s21, s12, s22] = s(f)
    for (const [cell, v] of [[0, s11], [1, s12], [2, s21], [3, s22]] as const) {
      re[k * 4 + cell] = v![0]
      im[k * 4 + cell] = v![1]
    }
  })
  return { ports: 2, impedances: [50, 50], frequencies, re, im }
}

const polar = (magnitude: number, degrees: number): [number, number] => {
  const r = (degrees * Math.PI) / 180
  return [magnitude * Math.cos(r), magnitude * Math.sin(r)]
}

/** Invented low-noise amplifier, 2.0–2.9 GHz: gain about 15 dB, a poor input match near −6 dB. */
export function inventedAmplifier(): TouchstoneData {
  const f0 = 2.45e9
  return twoPort(band(2.0e9, 2.9e9, 91), (f) => {
    const x = (f - f0) / f0
    const gainDb = 15 - 8 * x * x // gently falling away from the centre
    const delay = 0.45e-9 // an invented group delay through the stage
    return [
      polar(10 ** (-6 / 20) * (1 + 0.2 * x), -60 - 400 * x), // S11: about −6 dB
      polar(10 ** (gainDb / 20), 150 - 360 * f * delay), // S21
      polar(10 ** (-30 / 20), -20 - 360 * f * delay), // S12: reverse isolation about 30 dB
      polar(10 ** (-12 / 20), 40 - 300 * x), // S22: about −12 dB
    ]
  })
}

/**
 * Invented band-pass filter at 2.45 GHz: one series L-C resonator of loaded Q 5 between 50 Ω ports,
 * lossless. With Z = j·2·Z0·Q·(f/f0 − f0/f): S21 = 2Z0/(2Z0 + Z), S11 = Z/(2Z0 + Z).
 */
export function inventedBandPass(): TouchstoneData {
  const f0 = 2.45e9, q = 5
  return twoPort(band(1.5e9, 3.5e9, 201), (f) => {
    const y = q * (f / f0 - f0 / f) // Z / (2·Z0), imaginary
    const d = 1 + y * y // |1 + jy|²
    const s21: [number, number] = [1 / d, -y / d] // 1/(1 + jy)
    const s11: [number, number] = [(y * y) / d, y / d] // jy/(1 + jy)
    return [s11, s21, s21, s11]
  })
}

const INVENTED = 'Invented demo data of the Quillmere Microwave Lab scenario: generated from a simple model, not measured.'

/** The demo files by name, as Touchstone text. */
export function demoTouchstoneFiles(): Array<{ name: string; text: string }> {
  return [
    { name: 'lna-invented.s2p', text: writeTouchstone(inventedAmplifier(), { comments: [INVENTED, 'Low-noise amplifier stage: gain about 15 dB, input match about -6 dB.'], format: 'DB', unit: 'GHZ' }) },
    { name: 'bandpass-invented.s2p', text: writeTouchstone(inventedBandPass(), { comments: [INVENTED, 'Band-pass filter: one series resonator at 2.45 GHz, loaded Q 5.'], format: 'MA', unit: 'GHZ' }) },
  ]
}
