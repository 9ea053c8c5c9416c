import { writeTouchstone, type TouchstoneData } from '../../../shared/touchstone/write'
import { evenBand as band, INVENTED_NOTE as INVENTED, inventedAmplifierText, twoPortData as twoPort } from '../../../shared/templates/invented-amplifier'

export { inventedAmplifier } from '../../../shared/templates/invented-amplifier'

/**
 * Invented "measured" parts of the demo lab, generated from simple models and written as
 * Touchstone files. The values are made up for the demo; no real part behaves exactly so.
 */

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

/** The demo files by name, as Touchstone text. */
export function demoTouchstoneFiles(): Array<{ name: string; text: string }> {
  return [
    { name: 'lna-invented.s2p', text: inventedAmplifierText() },
    { name: 'bandpass-invented.s2p', text: writeTouchstone(inventedBandPass(), { comments: [INVENTED, 'Band-pass filter: one series resonator at 2.45 GHz, loaded Q 5.'], format: 'MA', unit: 'GHZ' }) },
  ]
}
