/**
 * Conductor-loss factor of a rough surface (Hammerstad & Bekkadal, "Microstrip Handbook",
 * ELAB report STF44 A74169, University of Trondheim, 1975):
 * K = 1 + (2/π)·arctan(1.4·(Δ/δ)²), Δ the RMS roughness and δ the skin depth.
 * It rises from 1 (smooth) towards 2; fitted for Δ/δ up to about 2.
 */
export function roughnessFactor(rmsRoughness: number, skinDepthMetres: number): number {
  if (rmsRoughness <= 0) return 1
  return 1 + (2 / Math.PI) * Math.atan(1.4 * (rmsRoughness / skinDepthMetres) ** 2)
}
