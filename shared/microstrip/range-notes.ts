import { C0 } from './constants'

/** A model used outside its published range; `above` (Hz) limits the note to frequencies above it. */
export interface RangeNote {
  field: string
  message: string
  above?: number
}

const show = (x: number) => String(Number(x.toPrecision(3)))

/**
 * Where a microstrip of width ratio u = W/h on permittivity εr and height h (m) leaves the stated
 * ranges of the models used: Hammerstad–Jensen 1980 (0.01 ≤ u ≤ 100, εr ≤ 128),
 * Kirschning–Jansen 1982 (0.1 ≤ u ≤ 100, εr ≤ 20, h/λ0 ≤ 0.13) and
 * Jansen–Kirschning 1983 (0.1 ≤ u ≤ 10, εr ≤ 18, f·h ≤ 15 GHz·mm).
 * The results are still computed; these notes say where they are extrapolated.
 */
export function microstripRangeNotes(u: number, permittivity: number, height: number): RangeNote[] {
  const notes: RangeNote[] = []
  const ratio = `W/h = ${show(u)}`
  if (u < 0.01 || u > 100) notes.push({ field: 'width', message: `${ratio} is outside 0.01…100, the range of the Hammerstad–Jensen static model` })
  if (permittivity > 128) notes.push({ field: 'permittivity', message: `εr = ${show(permittivity)} is above 128, the range of the Hammerstad–Jensen static model` })
  if (u < 0.1 || u > 100) notes.push({ field: 'width', above: 0, message: `${ratio} is outside 0.1…100, the range of the Kirschning–Jansen dispersion model` })
  else if (u > 10) notes.push({ field: 'width', above: 0, message: `${ratio} is outside 0.1…10, the range of the Jansen–Kirschning frequency-dependent impedance` })
  if (permittivity > 20) notes.push({ field: 'permittivity', above: 0, message: `εr = ${show(permittivity)} is above 20, the range of the Kirschning–Jansen dispersion model` })
  else if (permittivity > 18) notes.push({ field: 'permittivity', above: 0, message: `εr = ${show(permittivity)} is above 18, the range of the Jansen–Kirschning frequency-dependent impedance` })
  const impedanceLimit = 15e9 * 1e-3 / height
  const dispersionLimit = (0.13 * C0) / height
  notes.push({ field: 'frequency', above: impedanceLimit, message: `above ${show(impedanceLimit / 1e9)} GHz (f·h > 15 GHz·mm) the Jansen–Kirschning frequency-dependent impedance is extrapolated` })
  notes.push({ field: 'frequency', above: dispersionLimit, message: `above ${show(dispersionLimit / 1e9)} GHz (h/λ0 > 0.13) the Kirschning–Jansen dispersion model is extrapolated` })
  return notes
}

/** The notes that apply at a frequency (Hz); without one, only the static ones. */
export function notesAt(notes: readonly RangeNote[], frequency?: number): RangeNote[] {
  return notes.filter(note => note.above === undefined || (frequency !== undefined && frequency > note.above))
}
