import type { RangeNote } from './range-notes'

const show = (x: number) => String(Number(x.toPrecision(3)))

/** Where an open end leaves the stated range of Kirschning, Jansen & Koster 1981 (0.01 ≤ u ≤ 100, εr ≤ 50). */
export function openEndRangeNotes(u: number, permittivity: number): RangeNote[] {
  const notes: RangeNote[] = []
  if (u < 0.01 || u > 100) notes.push({ field: 'width', message: `W/h = ${show(u)} is outside 0.01…100, the range of the Kirschning–Jansen–Koster open-end model` })
  if (permittivity > 50) notes.push({ field: 'permittivity', message: `εr = ${show(permittivity)} is above 50, the range of the Kirschning–Jansen–Koster open-end model` })
  return notes
}

/**
 * Where a step in width leaves the ranges of its closed forms (Gupta, Garg, Bahl & Bhartia 1996):
 * capacitance for εr ≤ 10 and 1.5 ≤ W1/W2 ≤ 3.5 (or εr = 9.6 up to 10); inductance for W1/W2 ≤ 5 at W2/h = 1.
 */
export function stepRangeNotes(wide: number, narrow: number, height: number, permittivity: number): RangeNote[] {
  const ratio = wide / narrow
  const notes: RangeNote[] = []
  if (ratio === 1) return notes
  if (ratio < 1.5) notes.push({ field: 'width', message: `W1/W2 = ${show(ratio)} is below 1.5, where the step-capacitance fit starts; it is extrapolated (and held at zero where it would turn negative)` })
  if (ratio > 10) notes.push({ field: 'width', message: `W1/W2 = ${show(ratio)} is above 10, the range of the step-capacitance fit` })
  if (ratio > 3.5 && Math.abs(permittivity - 9.6) > 0.5) notes.push({ field: 'permittivity', message: `for W1/W2 above 3.5 the step-capacitance fit was made at εr = 9.6 (this substrate has ${show(permittivity)})` })
  if (permittivity > 10) notes.push({ field: 'permittivity', message: `εr = ${show(permittivity)} is above 10, the range of the step-capacitance fit` })
  if (ratio > 5) notes.push({ field: 'width', message: `W1/W2 = ${show(ratio)} is above 5, the range of the step-inductance fit` })
  const narrowU = narrow / height
  if (Math.abs(narrowU - 1) > 0.1) notes.push({ field: 'width', message: `the step-inductance fit was made at W2/h = 1 (here ${show(narrowU)}); it is extrapolated` })
  return notes
}

/** Where a bend leaves the stated ranges of its fits (square: 2.5 ≤ εr ≤ 15, 0.1 ≤ u ≤ 5; mitred: 2.36 ≤ εr ≤ 10.4, 0.2 ≤ u ≤ 6). */
export function bendRangeNotes(u: number, permittivity: number, corner: 'square' | 'mitred'): RangeNote[] {
  const [uMin, uMax, eMin, eMax, name] = corner === 'mitred'
    ? [0.2, 6, 2.36, 10.4, 'the mitred-bend fit of Kirschning, Jansen & Koster']
    : [0.1, 5, 2.5, 15, 'the square-bend fit of Gupta, Garg, Bahl & Bhartia']
  const notes: RangeNote[] = []
  if (u < uMin || u > uMax) notes.push({ field: 'width', message: `W/h = ${show(u)} is outside ${uMin}…${uMax}, the range of ${name}` })
  if (permittivity < eMin || permittivity > eMax) notes.push({ field: 'permittivity', message: `εr = ${show(permittivity)} is outside ${eMin}…${eMax}, the range of ${name}` })
  return notes
}

/**
 * Where a tee leaves the range we give Hammerstad's 1981 closed forms (no numeric range is stated in what
 * we recall of the source, so these are Portwright's own limits): frequencies above half of
 * f_p1 = Z1/(2µ0h), where the main arm's parallel-plate model nears its first higher mode, and arms
 * whose impedance ratio puts the branch's reference plane past the main line's centre (d2 < 0).
 */
export function teeRangeNotes(cutoff: number, branchShift: number): RangeNote[] {
  const notes: RangeNote[] = [{ field: 'frequency', above: cutoff / 2, message: `above ${show(cutoff / 2e9)} GHz (half of f_p1 = Z1/(2µ0h)) the Hammerstad tee model is extrapolated` }]
  if (branchShift < 0) notes.push({ field: 'branchWidth', message: 'the arms\' impedance ratio is outside the Hammerstad tee fit (the branch\'s reference plane would lie past the main line\'s centre)' })
  return notes
}

/**
 * Where coupled microstrips leave the stated range of Garg & Bahl's 1979 model (0.2 ≤ W/h ≤ 2,
 * 0.05 ≤ s/h ≤ 2 [memory]); `quasiStaticLimit` (Hz) is where the model's lack of dispersion starts to tell.
 */
export function coupledRangeNotes(u: number, g: number, quasiStaticLimit: number): RangeNote[] {
  const notes: RangeNote[] = []
  if (u < 0.2 || u > 2) notes.push({ field: 'width', message: `W/h = ${show(u)} is outside 0.2…2, the range of the Garg–Bahl coupled-line model` })
  if (g < 0.05 || g > 2) notes.push({ field: 'gap', message: `s/h = ${show(g)} is outside 0.05…2, the range of the Garg–Bahl coupled-line model` })
  notes.push({ field: 'frequency', above: quasiStaticLimit, message: `above ${show(quasiStaticLimit / 1e9)} GHz a single strip's ε_eff has risen 2 % by dispersion, which the quasi-static coupled-line model leaves out` })
  return notes
}
