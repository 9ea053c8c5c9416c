import { TouchstoneError } from './error'
import { clip, numberAt, words } from './lines'
import { FREQUENCY_UNITS, type FrequencyUnit, type NumberFormat, type OptionLine, type ParameterKind } from './types'

/** The option line's defaults: `# GHZ S MA R 50`. */
export const DEFAULT_OPTIONS: Readonly<OptionLine> = { unit: 'GHZ', parameter: 'S', format: 'MA', resistance: 50 }

const PARAMETERS: readonly ParameterKind[] = ['S', 'Y', 'Z', 'H', 'G']
const FORMATS: readonly NumberFormat[] = ['RI', 'MA', 'DB']

/**
 * Reads `# <unit> <parameter> <format> R <n>`: options in any order, any of them omitted
 * (each then takes its default), case-insensitive. Each option may appear once.
 */
export function parseOptionLine(text: string, line: number): OptionLine {
  const options: OptionLine = { ...DEFAULT_OPTIONS }
  const seen = new Set<string>()
  const once = (kind: string, word: string): void => {
    if (seen.has(kind)) throw new TouchstoneError(line, `the option line gives the ${kind} twice (at "${clip(word)}")`)
    seen.add(kind)
  }
  const list = words(text.replace(/^#/, ''))
  for (let i = 0; i < list.length; i++) {
    const word = list[i]!
    const upper = word.toUpperCase()
    if (upper in FREQUENCY_UNITS) {
      once('frequency unit', word)
      options.unit = upper as FrequencyUnit
    } else if ((PARAMETERS as readonly string[]).includes(upper)) {
      once('parameter type', word)
      options.parameter = upper as ParameterKind
    } else if ((FORMATS as readonly string[]).includes(upper)) {
      once('number format', word)
      options.format = upper as NumberFormat
    } else if (upper === 'R') {
      once('reference resistance', word)
      const value = list[i + 1]
      if (value === undefined) throw new TouchstoneError(line, 'R on the option line must be followed by the reference resistance in ohms')
      options.resistance = numberAt(value, line, 'a reference resistance in ohms')
      if (!(options.resistance > 0)) throw new TouchstoneError(line, `the reference resistance must be greater than zero (got ${value})`)
      i++
    } else {
      throw new TouchstoneError(line, `"${clip(word)}" is not an option (expected a frequency unit HZ/KHZ/MHZ/GHZ, a parameter S/Y/Z/H/G, a format DB/MA/RI, or R with a resistance)`)
    }
  }
  return options
}
