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
function halfCircuit(branches: readonly number[], series: readonly number[], theta: number, k: number): { gamma: Complex; t: Complex } {
  let m: Complex[] = [[1, 0], [0, 0], [0, 0], [1, 0]]
  const cos = Math.cos(theta), sin = Math.sin(theta)
  const times = (n: Complex[]) => {
    const [a, b, c, d] = m
    const mul = (x: Complex, y: Complex): Complex => [x[0] * y[0] - x[1] * y[1], x[0] * y[1] + x[1] * y[0]]
    const add = (x: Complex, y: Complex): Complex => [x[0] + y[0], x[1] + y[1]]
    m = [add(mul(a!, n[0]!), mul(b!, n[2]!)), add(mul(a!, n[1]!), mul(b!, n[3]!)), add(mul(c!, n[0]!), mul(d!, n[2]!)), add(mul(c!, n[1]!), mul(d!, n[3]!))]
  }
  branches.forEach((y, i) => {
    times([[1, 0], [0, 0], [0, y * k], [1, 0]])
    const z = series[i]
    if (z !== undefined) times([[cos, 0], [0, z * sin], [0, sin / z], [cos, 0]])
  })
  const [a, b, c, d] = m as [Complex, Complex, Complex, Complex]
  const den: Complex = [a[0] + b[0] + c[0] + d[0], a[1] + b[1] + c[1] + d[1]]
  const dd = den[0] * den[0] + den[1] * den[1]
  const num: Complex = [a[0] + b[0] - c[0] - d[0], a[1] + b[1] - c[1] - d[1]]
  return {
    gamma: [(num[0] * den[0] + num[1] * den[1]) / dd, (num[1] * den[0] - num[0] * den[1]) / dd],
    t: [(2 * den[0]) / dd, (-2 * den[1]) / dd],
  }
}
