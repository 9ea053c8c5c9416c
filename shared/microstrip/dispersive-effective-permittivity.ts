/**
 * Effective permittivity at frequency (Kirschning & Jansen, "Accurate model for effective
 * dielectric constant of microstrip with validity up to millimetre-wave frequencies",
 * Electronics Letters 18(6), pp. 272–273, 1982):
 * ε_eff(f) = εr − (εr − ε_eff(0))/(1 + P), P = P1·P2·((0.1844 + P3·P4)·fn)^1.5763, fn = f·h in GHz·mm;
 * P1 = 0.27488 + (0.6315 + 0.525/(1 + 0.0157fn)^20)·u − 0.065683·e^(−8.7513u),
 * P2 = 0.33622·(1 − e^(−0.03442εr)), P3 = 0.0363·e^(−4.6u)·(1 − e^(−(fn/38.7)^4.97)),
 * P4 = 1 + 2.751·(1 − e^(−(εr/15.916)^8)).
 * Stated range: 0.1 ≤ u ≤ 100, 1 ≤ εr ≤ 20, h/λ0 ≤ 0.13 (fn ≤ about 39 GHz·mm), accuracy 0.6 %.
 */
export function dispersiveEffectivePermittivity(u: number, permittivity: number, staticEpsEff: number, fn: number): number {
  return permittivityDispersion(u, permittivity, staticEpsEff)(fn)
}

/** The same law with its frequency-independent terms worked out once, for sweeping one strip over fn (GHz·mm). */
export function permittivityDispersion(u: number, permittivity: number, staticEpsEff: number): (fn: number) => number {
  const p1Static = 0.27488 - 0.065683 * Math.exp(-8.7513 * u)
  const p2 = 0.33622 * (1 - Math.exp(-0.03442 * permittivity))
  const p3Static = 0.0363 * Math.exp(-4.6 * u)
  const p4 = 1 + 2.751 * (1 - Math.exp(-Math.pow(permittivity / 15.916, 8)))
  return (fn) => {
    const p1 = p1Static + (0.6315 + 0.525 / Math.pow(1 + 0.0157 * fn, 20)) * u
    const p3 = p3Static * (1 - Math.exp(-Math.pow(fn / 38.7, 4.97)))
    const p = p1 * p2 * Math.pow((0.1844 + p3 * p4) * fn, 1.5763)
    return permittivity - (permittivity - staticEpsEff) / (1 + p)
  }
}
