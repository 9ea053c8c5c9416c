/** Frequency units of the option line, with their multipliers to hertz. */
export const FREQUENCY_UNITS = { HZ: 1, KHZ: 1e3, MHZ: 1e6, GHZ: 1e9 } as const
export type FrequencyUnit = keyof typeof FREQUENCY_UNITS

/** Kinds of network data a Touchstone file may hold. */
export type ParameterKind = 'S' | 'Y' | 'Z' | 'H' | 'G'

/** How each complex value is written: real/imaginary, magnitude/angle, dB/angle (angles in degrees). */
export type NumberFormat = 'RI' | 'MA' | 'DB'

/** The option line as read, defaults filled in (`# GHZ S MA R 50`). */
export interface OptionLine {
  unit: FrequencyUnit
  parameter: ParameterKind
  format: NumberFormat
  /** Reference resistance R (Ω). */
  resistance: number
}

/** One frequency of two-port noise data. */
export interface NoisePoint {
  /** Hz. */
  frequency: number
  /** Minimum noise figure (dB). */
  nfMinDb: number
  /** Magnitude of the source reflection coefficient giving the minimum noise figure. */
  gammaOptMagnitude: number
  /** Its angle (degrees). */
  gammaOptDegrees: number
  /** Effective noise resistance in ohms (version 1 files write it divided by R). */
  rnOhms: number
}

/** File versions the reader tells apart; version 1.0 and 1.1 files share one syntax. */
export type TouchstoneVersion = '1' | '2.0' | '2.1'

/** How a version 2 file lists a matrix: all of it, or (for symmetric data) one triangle. */
export type MatrixFormat = 'Full' | 'Lower' | 'Upper'

/** Order of S12 and S21 in a version 2 two-port file's rows. */
export type TwoPortOrder = '12_21' | '21_12'

/**
 * A Touchstone file as read: S-parameters in the solver's layout (S(i+1)(j+1) at frequency k at
 * index (k·ports + i)·ports + j), referred to each port's reference impedance, whatever the file held.
 */
export interface TouchstoneFile {
  version: TouchstoneVersion
  /** The option line as written (defaults filled in). */
  options: OptionLine
  ports: number
  /** Reference impedance of each port (Ω): [Reference], or R for every port. */
  impedances: number[]
  /** Hz, strictly increasing. */
  frequencies: Float64Array
  re: Float64Array
  im: Float64Array
  /** Two-port noise data, when the file has it. */
  noise: NoisePoint[]
  matrixFormat: MatrixFormat
}
