/** Kinds of quantity a parameter can hold, with the SI unit used to check and display them. */
export type QuantityKind =
  | 'impedance'
  | 'resistance'
  | 'inductance'
  | 'capacitance'
  | 'frequency'
  | 'length'
  | 'angle'
  | 'decibel'
  | 'ratio'
  | 'count'
  | 'conductivity'

/** How a kind is checked (mathjs unit of the same dimension) and written (symbol, article + name). */
export interface QuantityInfo {
  /** mathjs unit with the dimension this kind must have; null for plain numbers. */
  unit: string | null
  /** Symbol shown after the number. */
  symbol: string
  /** Words used in messages, e.g. "an impedance". */
  label: string
  /** Whether SI prefixes (k, M, G, m, µ, n, p) are used for display. */
  prefixed: boolean
}

/** Unit, display symbol and message label of every quantity kind. */
export const QUANTITIES: Record<QuantityKind, QuantityInfo> = {
  impedance: { unit: 'ohm', symbol: 'Ω', label: 'an impedance', prefixed: true },
  resistance: { unit: 'ohm', symbol: 'Ω', label: 'a resistance', prefixed: true },
  inductance: { unit: 'H', symbol: 'H', label: 'an inductance', prefixed: true },
  capacitance: { unit: 'F', symbol: 'F', label: 'a capacitance', prefixed: true },
  frequency: { unit: 'Hz', symbol: 'Hz', label: 'a frequency', prefixed: true },
  length: { unit: 'm', symbol: 'm', label: 'a length', prefixed: true },
  angle: { unit: 'deg', symbol: '°', label: 'an angle', prefixed: false },
  decibel: { unit: null, symbol: 'dB', label: 'a number of decibels', prefixed: false },
  ratio: { unit: null, symbol: '', label: 'a plain number', prefixed: false },
  count: { unit: null, symbol: '', label: 'a whole number', prefixed: false },
  conductivity: { unit: 'S/m', symbol: 'S/m', label: 'a conductivity', prefixed: false },
}

/** Dimensions recognised in "wrong unit" messages, most common first. */
export const DIMENSION_NAMES: ReadonlyArray<readonly [string, string]> = [
  ['Hz', 'a frequency'],
  ['ohm', 'an impedance'],
  ['m', 'a length'],
  ['F', 'a capacitance'],
  ['H', 'an inductance'],
  ['s', 'a time'],
  ['deg', 'an angle'],
  ['S', 'a conductance'],
  ['S/m', 'a conductivity'],
  ['W', 'a power'],
  ['V', 'a voltage'],
  ['A', 'a current'],
]
