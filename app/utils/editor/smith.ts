/** Geometry of the Smith chart's grid, in units of the unit circle (Γ plane, y up). */

export interface Circle { cx: number, cy: number, r: number }

/** Resistance values with a grid circle. */
export const SMITH_R = [0, 0.2, 0.5, 1, 2, 5] as const
/** Reactance values with a grid arc (each drawn for +x and −x). */
export const SMITH_X = [0.2, 0.5, 1, 2, 5] as const

/** Circle of constant normalised resistance r: centre (r/(1+r), 0), radius 1/(1+r). */
export function resistanceCircle(r: number): Circle {
  return { cx: r / (1 + r), cy: 0, r: 1 / (1 + r) }
}

/** Circle of constant normalised reactance x: centre (1, 1/x), radius 1/|x| (only its part inside |Γ| ≤ 1 is drawn). */
export function reactanceCircle(x: number): Circle {
  return { cx: 1, cy: 1 / x, r: 1 / Math.abs(x) }
}

/** Where the constant-x arc meets the unit circle, besides Γ = 1. */
export function reactanceArcEnd(x: number): { x: number, y: number } {
  return { x: (x * x - 1) / (x * x + 1), y: (2 * x) / (x * x + 1) }
}

/** SVG path of the constant-x arc from Γ = 1 to the unit circle (SVG y down, scale `s`). */
export function reactanceArcPath(x: number, s: number): string {
  const end = reactanceArcEnd(x)
  const r = s / Math.abs(x)
  // The arc bends towards the chart's centre: clockwise on screen (SVG y down) for +x, anticlockwise for −x.
  const sweep = x > 0 ? 1 : 0
  return `M ${s} 0 A ${r} ${r} 0 0 ${sweep} ${end.x * s} ${-end.y * s}`
}

/** Polyline points of a reflection trace (SVG y down, scale `s`). */
export function tracePoints(re: ArrayLike<number>, im: ArrayLike<number>, s: number): string {
  const out: string[] = []
  for (let k = 0; k < re.length; k++) out.push(`${(re[k]! * s).toFixed(2)},${(-im[k]! * s).toFixed(2)}`)
  return out.join(' ')
}

/** Normalised impedance z = (1 + Γ)/(1 − Γ). */
export function gammaToZ(re: number, im: number): { r: number, x: number } {
  const dr = 1 - re
  const d = dr * dr + im * im
  return { r: (1 - re * re - im * im) / d, x: (2 * im) / d }
}
