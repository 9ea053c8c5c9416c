/** The Array view's figures and patterns from a solved network, all computed by shared/beams. */
import { arrayPatternDb, beamFigures, beamWeights, crossoverDb, type ArrayGeometry, type BeamFigures } from '~~/shared/beams/index'
import type { SolvedData } from '~~/app/workers/protocol'

/** Angles of the plotted patterns: −90…90° from broadside in 0.5° steps. */
export const PATTERN_ANGLES = Float64Array.from({ length: 361 }, (_, i) => -90 + i * 0.5)

export interface ArrayBeam {
  input: number
  figures: BeamFigures | null
  /** 10·log10(|AF|²/N) at PATTERN_ANGLES (element pattern included). */
  pattern: Float64Array
}

export interface ArrayBeams {
  beams: ArrayBeam[]
  /** Deepest crossing of beams neighbouring in angle, relative to their own peaks; null for fewer than two beams. */
  crossoverDb: number | null
}

/** Beams of every input at one sweep point. */
export function arrayBeamsAt(result: SolvedData, index: number, inputs: readonly number[], outputs: readonly number[], geometry: ArrayGeometry): ArrayBeams {
  const made = inputs.map((input) => {
    const weights = beamWeights(result, index, input, outputs)
    let figures: BeamFigures | null = null
    try { figures = beamFigures(weights, geometry) } catch { /* no power reaches the outputs from this input */ }
    return { input, weights, figures, pattern: arrayPatternDb(weights, geometry, PATTERN_ANGLES) }
  })
  const steered = made.filter(b => b.figures).sort((a, b) => a.figures!.peakDeg - b.figures!.peakDeg)
  let crossover: number | null = null
  for (let i = 0; i + 1 < steered.length; i++) {
    const level = crossoverDb({ weights: steered[i]!.weights, peakDeg: steered[i]!.figures!.peakDeg }, { weights: steered[i + 1]!.weights, peakDeg: steered[i + 1]!.figures!.peakDeg }, geometry)
    crossover = crossover === null ? level : Math.min(crossover, level)
  }
  return { beams: made.map(({ input, figures, pattern }) => ({ input, figures, pattern })), crossoverDb: crossover }
}

/** Beam peak direction (degrees) of each input at each of up to `most` sweep points; null where no power arrives. */
export function peaksOverSweep(result: SolvedData, inputs: readonly number[], outputs: readonly number[], geometryAt: (frequency: number) => ArrayGeometry, most = 101): { frequencies: Float64Array; peaks: Array<Array<number | null>> } {
  const count = result.frequencies.length
  const step = Math.max(1, Math.ceil(count / most))
  const indices: number[] = []
  for (let k = 0; k < count; k += step) indices.push(k)
  if (indices[indices.length - 1] !== count - 1) indices.push(count - 1)
  const frequencies = Float64Array.from(indices, k => result.frequencies[k]!)
  const peaks = inputs.map(input => indices.map((k) => {
    try {
      // A coarser search grid than the table's: a plot needs the direction, not its last hundredth of a degree.
      return beamFigures(beamWeights(result, k, input, outputs), geometryAt(result.frequencies[k]!), { gridStepDeg: 0.25 }).peakDeg
    } catch {
      return null
    }
  }))
  return { frequencies, peaks }
}
