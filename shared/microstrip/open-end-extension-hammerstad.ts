/**
 * Length extension Δl/h of an open-ended microstrip, the earlier closed form
 * (Hammerstad, "Equations for microstrip circuit design", Proc. 5th European Microwave Conf.,
 * Hamburg, 1975, pp. 268–272 [memory]):
 * Δl/h = 0.412·(ε + 0.3)(u + 0.264)/((ε − 0.258)(u + 0.8)), ε the effective permittivity.
 * Quoted as accurate to a few per cent for u ≥ 0.2 [memory]; kept as a cross-check of the 1981 model.
 */
export function openEndExtensionHammerstad(u: number, epsEff: number): number {
  return (0.412 * (epsEff + 0.3) * (u + 0.264)) / ((epsEff - 0.258) * (u + 0.8))
}
