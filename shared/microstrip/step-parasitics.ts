/** Lumped model of a step in width: total series inductance (H) and shunt capacitance (F). */
export interface StepParasitics {
  inductance: number
  capacitance: number
}

/**
 * Parasitics of a symmetric step in width from W1 (wide) to W2 (narrow) on height h (m), the closed
 * forms in Gupta, Garg, Bahl & Bhartia, "Microstrip Lines and Slotlines", 2nd ed., 1996, §3.4 [memory]
 * (fitted by Garg & Bahl, Int. J. Electronics 45, 1978, to computed data):
 * C/√(W1·W2) in pF/m = (10.1·log εr + 2.33)·W1/W2 − 12.6·log εr − 3.17   (εr ≤ 10, 1.5 ≤ W1/W2 ≤ 3.5),
 *                    = 130·log(W1/W2) − 44                              (εr = 9.6, 3.5 ≤ W1/W2 ≤ 10);
 * L/h in nH/m = 40.5·(W1/W2 − 1) − 75·log(W1/W2) + 0.2·(W1/W2 − 1)²   (W1/W2 ≤ 5, W2/h = 1).
 * Near W1/W2 = 1 the capacitance fit turns negative, where the step vanishes: it is held at zero.
 */
export function stepParasitics(wide: number, narrow: number, height: number, permittivity: number): StepParasitics {
  const ratio = wide / narrow
  const logEr = Math.log10(permittivity)
  const perMetre = ratio <= 3.5
    ? (10.1 * logEr + 2.33) * ratio - 12.6 * logEr - 3.17
    : 130 * Math.log10(ratio) - 44
  const capacitance = Math.max(0, perMetre) * 1e-12 * Math.sqrt(wide * narrow)
  const inductance = Math.max(0, 40.5 * (ratio - 1) - 75 * Math.log10(ratio) + 0.2 * (ratio - 1) ** 2) * 1e-9 * height
  return { inductance, capacitance }
}
