/**
 * Microstrip models: quasi-static impedance and effective permittivity (Hammerstad–Jensen 1980),
 * dispersion (Kirschning–Jansen 1982, Jansen–Kirschning 1983), losses, width synthesis and
 * discontinuities. Pure functions in SI units; see README "Microstrip models" for sources and ranges.
 */
export { C0, ETA0, MU0, DB_PER_NEPER } from './constants'
export type { MicrostripSubstrate } from './types'
export { homogeneousImpedance } from './homogeneous-impedance'
export { staticEffectivePermittivity } from './static-effective-permittivity'
export { thicknessWidths } from './thickness-widths'
export { staticMicrostrip, type StaticMicrostrip } from './static-microstrip'
export { normalisedFrequency } from './normalised-frequency'
export { dispersiveEffectivePermittivity, permittivityDispersion } from './dispersive-effective-permittivity'
export { dispersiveImpedance, impedanceDispersion } from './dispersive-impedance'
export { surfaceResistance } from './surface-resistance'
export { skinDepth } from './skin-depth'
export { roughnessFactor } from './roughness-factor'
export { conductorLoss, type ConductorLossInput } from './conductor-loss'
export { dielectricLoss } from './dielectric-loss'
export { analyseMicrostrip, microstripSweep, type MicrostripAnalysis } from './analyse-microstrip'
export { synthesiseWidth, type WidthSynthesis } from './synthesise-width'
export { lineFigures, type LineFigures, type LineFiguresOutcome, type LineQuestion } from './line-figures'
export { microstripRangeNotes, notesAt, type RangeNote } from './range-notes'
export { openEndExtension } from './open-end-extension'
export { openEndExtensionHammerstad } from './open-end-extension-hammerstad'
export { stepParasitics, type StepParasitics } from './step-parasitics'
export { bendParasitics, type BendParasitics } from './bend-parasitics'
export { bendRangeNotes, openEndRangeNotes, stepRangeNotes, teeRangeNotes } from './discontinuity-range-notes'
export { teeJunction, type TeeArm, type TeeJunction } from './tee-junction'
