/**
 * Static effective permittivity of a zero-thickness microstrip, u = W/h
 * (Hammerstad & Jensen, IEEE MTT-S Digest 1980, pp. 407–409):
 * ε_eff = (εr + 1)/2 + (εr − 1)/2·(1 + 10/u)^(−a·b), with
 * a = 1 + ln((u⁴ + (u/52)²)/(u⁴ + 0.432))/49 + ln(1 + (u/18.1)³)/18.7 and
 * b = 0.564·((εr − 0.9)/(εr + 3))^0.053.
 * Stated accuracy better than 0.2 % for 0.01 ≤ u ≤ 100 and εr ≤ 128.
 */
export function staticEffectivePermittivity(u: number, permittivity: number): number {
  const u4 = u ** 4
  const a = 1 + Math.log((u4 + (u / 52) ** 2) / (u4 + 0.432)) / 49 + Math.log(1 + (u / 18.1) ** 3) / 18.7
  const b = 0.564 * Math.pow((permittivity - 0.9) / (permittivity + 3), 0.053)
  return (permittivity + 1) / 2 + ((permittivity - 1) / 2) * Math.pow(1 + 10 / u, -a * b)
}
