/** Beams of a uniform linear array fed by a network: array factor, peak, widths, sidelobes, crossovers. */
export { arrayFactorPower } from './array-factor-power'
export { arrayPatternDb } from './array-pattern-db'
export { beamFigures, type BeamFigureOptions, type BeamFigures } from './beam-figures'
export { beamWeights } from './beam-weights'
export { bisectRoot } from './bisect-root'
export { crossoverDb, type SteeredBeam } from './crossover-db'
export { goldenSectionMax } from './golden-section-max'
export type { ArrayGeometry, ArrayWeights } from './types'
