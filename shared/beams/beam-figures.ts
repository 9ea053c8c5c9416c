import { arrayFactorPower } from './array-factor-power'
import { bisectRoot } from './bisect-root'
import { goldenSectionMax } from './golden-section-max'
import type { ArrayGeometry, ArrayWeights } from './types'

/** Figures of one beam; angles in degrees from broadside (−90…90). */
export interface BeamFigures {
  peakDeg: number
  /** 10·log10(|AF|²/N) at the peak. */
  peakDb: number
  /** Between the half-power points either side of the peak (a side that never drops to half stops at ±90°). */
  halfPowerWidthDeg: number
  halfPower: { lowDeg: number; highDeg: number }
  /** Highest lobe outside the main lobe, relative to the peak (dB); null when there is none in −90…90. */
  sidelobeDb: number | null
}

/** Options of `beamFigures`. */
export interface BeamFigureOptions {
  /** Step of the search grid (degrees); peaks and half-power points are then refined. @default 0.05 */
  gridStepDeg?: number
}

/**
 * Peak, half-power width and highest sidelobe of an array's pattern over −90…90° from broadside: a fine
 * grid finds each lobe, golden-section search refines its maximum, bisection the half-power points.
 * The main lobe runs between the minima either side of the peak. Throws a RangeError when no power arrives.
 */
export function beamFigures(weights: ArrayWeights, geometry: ArrayGeometry, options: BeamFigureOptions = {}): BeamFigures {
  const step = options.gridStepDeg ?? 0.05
  const count = Math.round(180 / step) + 1
  const angles = Float64Array.from({ length: count }, (_, i) => (i === count - 1 ? 90 : -90 + i * (180 / (count - 1))))
  const power = (theta: number) => arrayFactorPower(weights, geometry, theta)
  const grid = angles.map(power)
  let top = 0
  for (let i = 1; i < count; i++) if (grid[i]! > grid[top]!) top = i
  if (!(grid[top]! > 0)) throw new RangeError('no power reaches the array: every element is fed with zero amplitude')
  const refine = (i: number) => goldenSectionMax(power, angles[Math.max(i - 1, 0)]!, angles[Math.min(i + 1, count - 1)]!)
  const peakDeg = refine(top)
  const peak = power(peakDeg)

  const half = peak / 2
  const halfPoint = (direction: -1 | 1): number => {
    let i = top
    while (i + direction >= 0 && i + direction < count && grid[i + direction]! >= half) i += direction
    if (i + direction < 0 || i + direction >= count) return direction < 0 ? -90 : 90
    const inner = i === top ? peakDeg : angles[i]!
    return bisectRoot(theta => power(theta) - half, inner, angles[i + direction]!)
  }
  const lowDeg = halfPoint(-1), highDeg = halfPoint(1)

  // The main lobe falls away on both sides down to a minimum; any maximum beyond is another lobe.
  let left = top, right = top
  while (left > 0 && grid[left - 1]! <= grid[left]!) left--
  while (right < count - 1 && grid[right + 1]! <= grid[right]!) right++
  let sidelobe = 0
  for (let i = 0; i < count; i++) {
    if (i >= left && i <= right) continue
    const rising = i === 0 || grid[i]! >= grid[i - 1]!
    const falling = i === count - 1 || grid[i]! >= grid[i + 1]!
    if (rising && falling && grid[i]! > 0) sidelobe = Math.max(sidelobe, power(refine(i)))
  }
  return {
    peakDeg,
    peakDb: 10 * Math.log10(peak),
    halfPowerWidthDeg: highDeg - lowDeg,
    halfPower: { lowDeg, highDeg },
    sidelobeDb: sidelobe > 0 ? 10 * Math.log10(sidelobe / peak) : null,
  }
}
