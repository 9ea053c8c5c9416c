/** Normalised widths that account for the strip's thickness: u1 in air, ur in the dielectric. */
export interface ThicknessWidths {
  u1: number
  ur: number
}

/**
 * Effective widths of a strip of thickness t (Hammerstad & Jensen, IEEE MTT-S Digest 1980):
 * Δu1 = (t/π)·ln(1 + 4e/(t·coth²√(6.517u))) with t = T/h, Δur = ½(1 + 1/cosh√(εr − 1))·Δu1;
 * u1 = u + Δu1 (air), ur = u + Δur (dielectric). Zero thickness gives u1 = ur = u.
 */
export function thicknessWidths(u: number, thicknessOverHeight: number, permittivity: number): ThicknessWidths {
  const t = thicknessOverHeight
  if (t <= 0) return { u1: u, ur: u }
  const coth = 1 / Math.tanh(Math.sqrt(6.517 * u))
  const du1 = (t / Math.PI) * Math.log(1 + (4 * Math.E) / (t * coth * coth))
  const dur = 0.5 * (1 + 1 / Math.cosh(Math.sqrt(Math.max(permittivity - 1, 0)))) * du1
  return { u1: u + du1, ur: u + dur }
}
