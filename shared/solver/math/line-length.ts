import type { ParamValues } from '../../network/params'

const C0 = 299_792_458

/** Electrical length and loss of a line: θ = radiansPerHz·f, attenuation α = nepersPerRadian·θ. */
export interface LineLength {
  radiansPerHz: number
  nepersPerRadian: number
}

/** Parameters shared by `line` and `stub`, checked together by `checkLineLength`. */
export const LINE_LENGTH_PARAMS = {
  impedance: { kind: 'impedance', required: true, above: 0 },
  degrees: { kind: 'angle', min: 0 },
  at: { kind: 'frequency', above: 0 },
  length: { kind: 'length', min: 0 },
  velocityFactor: { kind: 'ratio', default: 1, above: 0, max: 1 },
  lossDb: { kind: 'decibel', default: 0, min: 0 },
} as const

/** Checks that a line's length is given exactly one way: degrees with at, or length. */
export function checkLineLength(values: ParamValues): Array<{ field?: string; message: string }> {
  const hasDegrees = values.degrees !== undefined
  const hasLength = values.length !== undefined
  if (hasDegrees && hasLength) return [{ field: 'length', message: 'give the length either as degrees with at, or as length, not both' }]
  if (!hasDegrees && !hasLength) return [{ field: 'degrees', message: 'is required (or give length in metres instead)' }]
  if (hasDegrees && values.at === undefined) return [{ field: 'at', message: 'is required with degrees: the frequency at which the line has that electrical length' }]
  return []
}

/** Electrical length per hertz and loss per radian from checked line parameters. */
export function lineLength(values: ParamValues): LineLength {
  const radiansPerHz = values.degrees !== undefined
    ? ((values.degrees as number) * Math.PI) / 180 / (values.at as number)
    : (2 * Math.PI * (values.length as number)) / ((values.velocityFactor as number) * C0)
  // lossDb is per wavelength (2π rad); 1 Np = 20/ln 10 dB.
  const nepersPerRadian = ((values.lossDb as number) * Math.LN10) / 20 / (2 * Math.PI)
  return { radiansPerHz, nepersPerRadian }
}
