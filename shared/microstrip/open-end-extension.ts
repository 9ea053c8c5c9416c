/**
 * Length extension Δl/h of an open-ended microstrip (Kirschning, Jansen & Koster, "Accurate model
 * for open end effect of microstrip lines", Electronics Letters 17(3), pp. 123–125, 1981):
 * Δl/h = ξ1·ξ3·ξ5/ξ4 with
 * ξ1 = 0.434907·(ε^0.81 + 0.26)/(ε^0.81 − 0.189)·(u^0.8544 + 0.236)/(u^0.8544 + 0.87),
 * ξ2 = 1 + u^0.371/(2.358εr + 1), ξ3 = 1 + 0.5274·arctan(0.084·u^(1.9413/ξ2))/ε^0.9236,
 * ξ4 = 1 + 0.0377·arctan(0.067·u^1.456)·(6 − 5·e^(0.036(1 − εr))), ξ5 = 1 − 0.218·e^(−7.5u),
 * ε the effective permittivity. Stated range 0.01 ≤ u ≤ 100, εr ≤ 50, accuracy about 2.5 %.
 */
export function openEndExtension(u: number, permittivity: number, epsEff: number): number {
  const e81 = epsEff ** 0.81
  const un = u ** 0.8544
  const xi1 = 0.434907 * ((e81 + 0.26) / (e81 - 0.189)) * ((un + 0.236) / (un + 0.87))
  const xi2 = 1 + u ** 0.371 / (2.358 * permittivity + 1)
  const xi3 = 1 + (0.5274 * Math.atan(0.084 * u ** (1.9413 / xi2))) / epsEff ** 0.9236
  const xi4 = 1 + 0.0377 * Math.atan(0.067 * u ** 1.456) * (6 - 5 * Math.exp(0.036 * (1 - permittivity)))
  const xi5 = 1 - 0.218 * Math.exp(-7.5 * u)
  return (xi1 * xi3 * xi5) / xi4
}
