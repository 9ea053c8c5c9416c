import { conductorLoss } from './conductor-loss'
import { dielectricLoss } from './dielectric-loss'
import { permittivityDispersion } from './dispersive-effective-permittivity'
import { impedanceDispersion } from './dispersive-impedance'
import { normalisedFrequency } from './normalised-frequency'
import { staticMicrostrip } from './static-microstrip'
import type { MicrostripSubstrate } from './types'

/** A microstrip line at one frequency: impedance (Ω), effective permittivity and attenuation (Np/m). */
export interface MicrostripAnalysis {
  impedance: number
  epsEff: number
  staticImpedance: number
  staticEpsEff: number
  conductorLoss: number
  dielectricLoss: number
}

/**
 * Analyses a microstrip of width W (m) on a substrate at frequency f (Hz; 0 for the static values):
 * Hammerstad–Jensen 1980 static model with thickness correction, Kirschning–Jansen 1982 dispersion of
 * ε_eff, Jansen–Kirschning 1983 dispersion of Z0, Hammerstad–Jensen conductor loss with the
 * Hammerstad–Bekkadal roughness factor and the textbook dielectric loss. The dispersion models take
 * the thickness-corrected static values and the plain ratio u = W/h.
 */
export function analyseMicrostrip(substrate: MicrostripSubstrate, width: number, frequency = 0): MicrostripAnalysis {
  return microstripSweep(substrate, width)(frequency)
}

/**
 * The same analysis for one strip at many frequencies: everything that does not depend on frequency
 * (the static model, the frequency-independent terms of the dispersion laws) is worked out once.
 */
export function microstripSweep(substrate: MicrostripSubstrate, width: number): (frequency: number) => MicrostripAnalysis {
  const u = width / substrate.height
  const quasi = staticMicrostrip(u, substrate.thickness / substrate.height, substrate.permittivity)
  const epsAt = permittivityDispersion(u, substrate.permittivity, quasi.epsEff)
  const impedanceAt = impedanceDispersion(u, substrate.permittivity, quasi.impedance, quasi.epsEff)
  const metal = substrate.conductivity === undefined
    ? undefined
    : { width, conductivity: substrate.conductivity, roughness: substrate.roughness, impedance: quasi.impedance, airImpedance: quasi.airImpedance }
  return (frequency) => {
    if (frequency <= 0) {
      return { impedance: quasi.impedance, epsEff: quasi.epsEff, staticImpedance: quasi.impedance, staticEpsEff: quasi.epsEff, conductorLoss: 0, dielectricLoss: 0 }
    }
    const fn = normalisedFrequency(frequency, substrate.height)
    const epsEff = epsAt(fn)
    return {
      impedance: impedanceAt(epsEff, fn),
      epsEff,
      staticImpedance: quasi.impedance,
      staticEpsEff: quasi.epsEff,
      conductorLoss: metal ? conductorLoss(frequency, metal) : 0,
      dielectricLoss: dielectricLoss(frequency, substrate.permittivity, epsEff, substrate.lossTangent),
    }
  }
}
