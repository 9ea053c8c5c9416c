/**
 * Multi-section quarter-wave transformers by the theory of small reflections
 * (Pozar, Microwave Engineering, 4th ed., §5.5–5.7). Each section n has reflection Γn at its
 * junction, ln(Z(n+1)/Zn) = 2·Γn, so the impedances step from Z0 to ZL exactly.
 */

/** Section impedances (Ω, from the Z0 side) of a binomial transformer: 2Γn = 2^−N·C(N, n)·ln(ZL/Z0) (Pozar §5.6). */
export function binomialSections(z0: number, zl: number, sections: number): number[] {
  const logRatio = Math.log(zl / z0)
  return stepImpedances(z0, Array.from({ length: sections }, (_, n) => 2 ** -sections * binomial(sections, n) * logRatio))
}

/** Fractional bandwidth of a binomial transformer for a largest |Γ| of `gm` (Pozar §5.6). */
export function binomialBandwidth(z0: number, zl: number, sections: number, gm: number): number {
  const a = Math.abs(2 ** -sections * ((zl - z0) / (zl + z0)))
  const thetaM = Math.acos(0.5 * (gm / a) ** (1 / sections))
  return 2 - (4 * thetaM) / Math.PI
}

/** sec θm of a Chebyshev transformer: T_N(sec θm) = |ln(ZL/Z0)|/(2Γm) (Pozar §5.7); undefined when Γm is too large. */
export function chebyshevSecant(z0: number, zl: number, sections: number, gm: number): number | undefined {
  const x = Math.abs(Math.log(zl / z0)) / (2 * gm)
  return x > 1 ? Math.cosh(Math.acosh(x) / sections) : undefined
}

/**
 * Section impedances (Ω, from the Z0 side) of a Chebyshev (equal-ripple) transformer with
 * ripple Γm: Γ(θ) = A·e^(−jNθ)·T_N(sec θm·cos θ), A = ±Γm, expanded in cos((N − 2n)θ) to give
 * each Γn (Pozar §5.7, computed from the polynomial for any N).
 */
export function chebyshevSections(z0: number, zl: number, sections: number, gm: number): number[] {
  const sec = chebyshevSecant(z0, zl, sections, gm)
  if (sec === undefined) throw new Error('the largest reflection is above the mismatch of the load itself')
  const a = Math.sign(Math.log(zl / z0)) * gm
  const cosine = cosineSeries(theta => chebyshev(sections, sec * Math.cos(theta)), sections)
  // Γ(θ)·e^(jNθ) = 2·Σ Γn·cos((N − 2n)θ) for n < N/2, plus Γ(N/2) alone when N is even.
  const gammas = Array.from({ length: sections + 1 }, (_, n) => {
    const order = Math.abs(sections - 2 * n)
    return order === 0 ? a * cosine[0]! : (a * cosine[order]!) / 2
  })
  return stepImpedances(z0, gammas.slice(0, sections).map(g => 2 * g))
}

/** Fractional bandwidth of a Chebyshev transformer: 2 − 4θm/π (Pozar §5.7). */
export function chebyshevBandwidth(z0: number, zl: number, sections: number, gm: number): number | undefined {
  const sec = chebyshevSecant(z0, zl, sections, gm)
  return sec === undefined ? undefined : 2 - (4 * Math.acos(1 / sec)) / Math.PI
}

/** Chebyshev polynomial of the first kind, T_N(x), for any real x. */
export function chebyshev(order: number, x: number): number {
  let previous = 1, current = x
  if (order === 0) return 1
  for (let k = 1; k < order; k++) [previous, current] = [current, 2 * x * current - previous]
  return current
}

// Coefficients c_k of f(θ) = Σ c_k cos kθ (k = 0…N) for a cosine polynomial of degree N, exactly by sampling.
function cosineSeries(f: (theta: number) => number, degree: number): number[] {
  const m = 2 * degree + 2
  const samples = Array.from({ length: m }, (_, i) => f((Math.PI * (i + 0.5)) / m))
  return Array.from({ length: degree + 1 }, (_, k) => {
    const sum = samples.reduce((acc, v, i) => acc + v * Math.cos((k * Math.PI * (i + 0.5)) / m), 0)
    return ((k === 0 ? 1 : 2) * sum) / m
  })
}

function binomial(n: number, k: number): number {
  let r = 1
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i
  return r
}

function stepImpedances(z0: number, logSteps: number[]): number[] {
  let z = z0
  return logSteps.map(step => (z = z * Math.exp(step)))
}
