import { analyseMicrostrip } from './analyse-microstrip'
import { C0, DB_PER_NEPER } from './constants'
import { microstripRangeNotes, notesAt, type RangeNote } from './range-notes'
import { synthesiseWidth } from './synthesise-width'
import type { MicrostripSubstrate } from './types'

/** What a line calculation is asked: a width to analyse or an impedance to reach, optionally at a frequency and an electrical length (degrees). */
export type LineQuestion = ({ width: number } | { impedance: number }) & { frequency?: number; degrees?: number }

/** A line's figures in SI units; wavelength and loss need a frequency, length needs degrees too. */
export interface LineFigures {
  width: number
  impedance: number
  epsEff: number
  wavelength?: number
  length?: number
  lossDbPerMetre?: number
}

/** Outcome of `lineFigures`: the figures with the range notes that apply, or why no width fits (`field` names the input). */
export type LineFiguresOutcome = { ok: true; figures: LineFigures; notes: RangeNote[] } | { ok: false; field: 'impedance'; message: string }

/**
 * Analyses a microstrip (given its width) or synthesises its width (given an impedance) on a substrate.
 * With a frequency the figures are those at that frequency (dispersion included) and a synthesis finds
 * the width whose Z0(f) is the impedance asked for; without one they are static.
 * Used by the `line` command and the editor's line calculator, so both give the same numbers.
 */
export function lineFigures(substrate: MicrostripSubstrate, question: LineQuestion): LineFiguresOutcome {
  const frequency = question.frequency
  let width: number
  if ('width' in question) width = question.width
  else {
    const found = synthesiseWidth(substrate, question.impedance, frequency ?? 0)
    if (!found.ok) return { ok: false, field: 'impedance', message: found.message }
    width = found.width
  }
  const line = analyseMicrostrip(substrate, width, frequency ?? 0)
  const figures: LineFigures = { width, impedance: line.impedance, epsEff: line.epsEff }
  if (frequency !== undefined && frequency > 0) {
    figures.wavelength = C0 / (frequency * Math.sqrt(line.epsEff))
    if (question.degrees !== undefined) figures.length = (question.degrees / 360) * figures.wavelength
    figures.lossDbPerMetre = DB_PER_NEPER * (line.conductorLoss + line.dielectricLoss)
  }
  const notes = notesAt(microstripRangeNotes(width / substrate.height, substrate.permittivity, substrate.height), frequency)
  return { ok: true, figures, notes }
}
