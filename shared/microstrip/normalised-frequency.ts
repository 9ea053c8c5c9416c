/** Frequency–height product fn = f·h in GHz·mm, the variable of the Kirschning–Jansen dispersion models. */
export function normalisedFrequency(frequency: number, height: number): number {
  return (frequency / 1e9) * (height * 1e3)
}
