import { writeTouchstone, type TouchstoneData } from '../touchstone/write'

/**
 * The invented low-noise amplifier of the Quillmere demo lab, generated from a simple model and
 * written as a Touchstone file. The values are made up for the demo; no real part behaves exactly so.
 * The demo seed and the balanced-amplifier template share this one file, byte for byte.
 */

/** Name of the invented amplifier's file in a project. */
export const INVENTED_AMPLIFIER_FILE = 'lna-invented.s2p'

/** First comment line of every invented demo file. */
export const INVENTED_NOTE = 'Invented demo data of the Quillmere Microwave Lab scenario: generated from a simple model, not measured.'

/** Frequencies from `start` to `stop` (Hz), `points` evenly spaced. */
export function evenBand(start: number, stop: number, points: number): Float64Array {
  return Float64Array.from({ length: points }, (_, k) => start + ((stop - start) * k) / (points - 1))
}

/** A two-port data set from a function giving S11, S21, S12, S22 as [re, im] pairs at each frequency. */
export function twoPortData(frequencies: Float64Array, s: (f: number) => [number, number][]): TouchstoneData {
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
  return twoPortData(evenBand(2.0e9, 2.9e9, 91), (f) => {
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

/** The invented amplifier as the Touchstone text stored in projects. */
export function inventedAmplifierText(): string {
  return writeTouchstone(inventedAmplifier(), { comments: [INVENTED_NOTE, 'Low-noise amplifier stage: gain about 15 dB, input match about -6 dB.'], format: 'DB', unit: 'GHZ' })
}
