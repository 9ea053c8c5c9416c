import { analyseMicrostrip } from './analyse-microstrip'
import type { MicrostripSubstrate } from './types'

/** Outcome of a width synthesis: the width (m), or why no width gives that impedance. */
export type WidthSynthesis = { ok: true; width: number } | { ok: false; message: string }

/** Width ratios searched, W/h: wider than any stated model range so the range notes can speak instead. */
const U_MIN = 1e-3
const U_MAX = 1e3

/**
 * Width (m) of a microstrip with characteristic impedance Z (Ω) at frequency f (0: static), found by
 * bisection in ln(W/h) on `analyseMicrostrip`, whose impedance falls as the strip widens. Bisection
 * runs until the bracket is below 1e-13 relative, so analysis of the result gives Z back to about 1e-12.
 */
export function synthesiseWidth(substrate: MicrostripSubstrate, impedance: number, frequency = 0): WidthSynthesis {
  const z = (u: number) => analyseMicrostrip(substrate, u * substrate.height, frequency).impedance
  const narrowest = z(U_MIN), widest = z(U_MAX)
  if (!(impedance <= narrowest && impedance >= widest)) {
    return { ok: false, message: `no strip width between ${U_MIN}·h and ${U_MAX}·h gives ${impedance} Ω on this substrate (from ${widest.toFixed(2)} Ω to ${narrowest.toFixed(1)} Ω)` }
  }
  let lo = Math.log(U_MIN), hi = Math.log(U_MAX)
  for (let step = 0; step < 200 && hi - lo > 1e-13; step++) {
    const mid = 0.5 * (lo + hi)
    if (z(Math.exp(mid)) > impedance) lo = mid
    else hi = mid
  }
  return { ok: true, width: Math.exp(0.5 * (lo + hi)) * substrate.height }
}
