/** Magnitudes and phase (degrees) of a branch-line coupler's first column at one frequency. */
export interface BranchLineSample {
  s11: number
  s21: number
  s31: number
  s41: number
  /** ∠S21 − ∠S31, wrapped to (−180°, 180°]. */
  phaseDeg: number
}

/**
 * First column of S (ports 1 in, 2 through, 3 coupled, 4 isolated) of a symmetric branch-line
 * coupler of ideal lines, by even/odd modes: each half circuit is the cascade of the series
 * arms (impedances `series`, normalised, a quarter wave at f0) with the halves of the branches
 * (admittances `branches`, normalised) as λ/8 stubs, open in the even mode and shorted in the
 * odd one. `ratio` is f/f0. Used to compare candidate designs quickly; the solver checks them.
 */
export function branchLineResponse(branches: readonly number[], series: readonly number[], ratio: number): BranchLineSample {
  const theta = (Math.PI / 2) * ratio
  const even = halfCircuit(branches, series, theta, Math.tan(theta / 2))
  const odd = halfCircuit(branches, series, theta, -1 / Math.tan(theta / 2))
  const half = (a: [number, number], b: [number, number], sign: number): [number, number] => [(a[0] + sign * b[0]) / 2, (a[1] + sign * b[1]) / 2]
  const s11 = half(even.gamma, odd.gamma, 1), s41 = half(even.gamma, odd.gamma, -1)
  const s21 = half(even.t, odd.t, 1), s31 = half(even.t, odd.t, -1)
  let phase = ((Math.atan2(s21[1], s21[0]) - Math.atan2(s31[1], s31[0])) * 180) / Math.PI
  if (phase > 180) phase -= 360
  if (phase <= -180) phase += 360
  return { s11: Math.hypot(...s11), s21: Math.hypot(...s21), s31: Math.hypot(...s31), s41: Math.hypot(...s41), phaseDeg: phase }
}

type Complex = [number, number]

// ABCD of the half circuit, each stub a shunt admittance j·y·k (k = tan(θ/2) open, −cot(θ/2) short).
// Entries kept as scalars (aR + j·aI …): this runs thousands of times while arms are chosen.
function halfCircuit(branches: readonly number[], series: readonly number[], theta: number, k: number): { gamma: Complex; t: Complex } {
  let aR = 1, aI = 0, bR = 0, bI = 0, cR = 0, cI = 0, dR = 1, dI = 0
  const cos = Math.cos(theta), sin = Math.sin(theta)
  for (let i = 0; i < branches.length; i++) {
    // × [[1, 0], [j·y·k, 1]]: a += b·jyk, c += d·jyk.
    const yk = branches[i]! * k
    aR -= bI * yk; aI += bR * yk
    cR -= dI * yk; cI += dR * yk
    const z = series[i]
    if (z === undefined) continue
    // × [[cos, j·z·sin], [j·sin/z, cos]].
    const zs = z * sin, ys = sin / z
    const naR = aR * cos - bI * ys, naI = aI * cos + bR * ys
    const nbR = -aI * zs + bR * cos, nbI = aR * zs + bI * cos
    const ncR = cR * cos - dI * ys, ncI = cI * cos + dR * ys
    const ndR = -cI * zs + dR * cos, ndI = cR * zs + dI * cos
    aR = naR; aI = naI; bR = nbR; bI = nbI; cR = ncR; cI = ncI; dR = ndR; dI = ndI
  }
  const denR = aR + bR + cR + dR, denI = aI + bI + cI + dI
  const dd = denR * denR + denI * denI
  const numR = aR + bR - cR - dR, numI = aI + bI - cI - dI
  return {
    gamma: [(numR * denR + numI * denI) / dd, (numI * denR - numR * denI) / dd],
    t: [(2 * denR) / dd, (-2 * denI) / dd],
  }
}
