/**
 * Characteristic impedance at frequency (Jansen & Kirschning, "Arguments and an accurate model
 * for the power-current formulation of microstrip characteristic impedance", AEÜ 37,
 * pp. 108–112, 1983): Z0(f) = Z0(0)·(R13/R14)^R17 with the auxiliary terms R1…R17 of that paper,
 * fn = f·h in GHz·mm. At fn = 0 the ratio R13/R14 is 1, so Z0(f) starts at the static value.
 * Stated range: 0.1 ≤ u ≤ 10, 1 ≤ εr ≤ 18, fn ≤ 15 GHz·mm, accuracy about 1 % [memory].
 */
export function dispersiveImpedance(u: number, permittivity: number, staticImpedance: number, staticEpsEff: number, epsEffAtF: number, fn: number): number {
  return impedanceDispersion(u, permittivity, staticImpedance, staticEpsEff)(epsEffAtF, fn)
}

/** The same model with its frequency-independent terms worked out once: Z0 from ε_eff(f) and fn (GHz·mm). */
export function impedanceDispersion(u: number, permittivity: number, staticImpedance: number, staticEpsEff: number): (epsEffAtF: number, fn: number) => number {
  const er = permittivity
  const r1 = 0.03891 * er ** 1.4
  const r2 = 0.267 * u ** 7
  const r3 = 4.766 * Math.exp(-3.228 * u ** 0.641)
  const r4 = 0.016 + (0.0514 * er) ** 4.524
  const r6 = 22.2 * u ** 1.92
  const r7 = 1.206 - 0.3144 * Math.exp(-r1) * (1 - Math.exp(-r2))
  const r8Scale = 0.004625 * r3 * er ** 1.674
  const e6 = (er - 1) ** 6
  const r9Scale = ((5.086 * r4) / (0.3838 + 0.386 * r4)) * Math.exp(-r6) * (e6 / (1 + 10 * e6))
  const r10 = 0.00044 * er ** 2.136 + 0.0184
  const r12 = 1 / (1 + 0.00245 * u * u)
  const r16Scale = 0.0503 * er * er * (1 - Math.exp(-((u / 15) ** 6)))
  return (epsEffAtF, fn) => {
    const r5 = (fn / 28.843) ** 12
    const r8 = 1 + 1.275 * (1 - Math.exp(-r8Scale * (fn / 18.365) ** 2.745))
    const r9 = (r9Scale * r5) / (1 + 1.2992 * r5)
    const x = (fn / 19.47) ** 6
    const r11 = x / (1 + 0.0962 * x)
    const r13 = 0.9408 * epsEffAtF ** r8 - 0.9603
    const r14 = (0.9408 - r9) * staticEpsEff ** r8 - 0.9603
    const r15 = 0.707 * r10 * (fn / 12.3) ** 1.097
    const r16 = 1 + r16Scale * r11
    const r17 = r7 * (1 - 1.1241 * (r12 / r16) * Math.exp(-0.026 * fn ** 1.15656 - r15))
    return staticImpedance * (r13 / r14) ** r17
  }
}
