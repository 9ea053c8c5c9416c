/** Lumped model of a right-angle bend: series inductance in each arm (H) and shunt capacitance (F). */
export interface BendParasitics {
  inductance: number
  capacitance: number
}

/**
 * Parasitics of a right-angle bend of width W on height h (m), u = W/h [memory]:
 * square corner (Gupta, Garg, Bahl & Bhartia, "Microstrip Lines and Slotlines", 2nd ed., 1996, §3.4,
 * fitted to computed data; stated for 2.5 ≤ εr ≤ 15, 0.1 ≤ u ≤ 5):
 * C/W in pF/m = ((14εr + 12.5)u − (1.83εr − 2.25))/√u + 0.02εr/u (u < 1), (9.5εr + 1.25)u + 5.2εr + 7.0 (u ≥ 1);
 * L/h in nH/m = 100·(4√u − 4.21) (negative for narrow strips: the reference planes sit at the corner).
 * Optimally mitred corner (Kirschning, Jansen & Koster, "Measurement and computer-aided modeling of microstrip
 * discontinuities by an improved resonator method", IEEE MTT-S Digest 1983, pp. 495–497;
 * stated for 2.36 ≤ εr ≤ 10.4, 0.2 ≤ u ≤ 6):
 * C/W in pF/m = (3.93εr + 0.62)u + 7.6εr + 3.80; L/h in nH/m = 440.2·(1 − 1.062·e^(−0.177·u^0.947)).
 */
export function bendParasitics(width: number, height: number, permittivity: number, corner: 'square' | 'mitred'): BendParasitics {
  const u = width / height, er = permittivity
  if (corner === 'mitred') {
    return {
      capacitance: ((3.93 * er + 0.62) * u + 7.6 * er + 3.8) * 1e-12 * width,
      inductance: 440.2 * (1 - 1.062 * Math.exp(-0.177 * u ** 0.947)) * 1e-9 * height,
    }
  }
  const perWidth = u < 1
    ? ((14 * er + 12.5) * u - (1.83 * er - 2.25)) / Math.sqrt(u) + (0.02 * er) / u
    : (9.5 * er + 1.25) * u + 5.2 * er + 7.0
  return { capacitance: perWidth * 1e-12 * width, inductance: 100 * (4 * Math.sqrt(u) - 4.21) * 1e-9 * height }
}
