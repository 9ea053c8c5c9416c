/**
 * The Response or Balance plot as data (traces with units, colours, axes), the same as the dock
 * draws it; CSV, SVG and the printable report are made from this.
 */
import type { SolvedData } from '~~/app/workers/protocol'
import { parseTraceName, traceQuantity, type Quantity } from '~~/app/utils/editor/traces'
import { PHASE_DASH, traceColour } from '~~/app/utils/editor/tracePalette'
import { responseAxisRange, type AxisRange } from '~~/app/utils/editor/plotRange'
import { balance } from '~~/app/utils/editor/balance'
import { BALANCE_DB_HALF_SPAN, BALANCE_DEG_HALF_SPAN, balanceAxisRange } from '~~/app/utils/editor/balanceRange'

/** One plotted trace: its values unclipped, in `unit`, on the left ('y') or right ('y2') axis. */
export interface ShownSeries {
  label: string
  unit: string
  values: Float64Array
  colour: string
  dash?: readonly number[]
  scale: 'y' | 'y2'
  /** A target line, drawn but not exported as data. */
  guide?: boolean
}

/** A frequency plot: x in Hz, the series, and each axis's unit and range (null: fit the data). */
export interface ShownPlot {
  title: string
  x: Float64Array
  series: ShownSeries[]
  yUnit: string
  yRange: AxisRange | null
  y2Unit?: string
  y2Range?: AxisRange | null
}

/** Units of the Response quantities as the plots write them. */
export const QUANTITY_UNITS: Record<Quantity, string> = { db: 'dB', phase: '°', unwrapped: '°', delay: 's', vswr: '' }
const QUANTITY_TITLES: Record<Quantity, string> = { db: 'Magnitude', phase: 'Phase', unwrapped: 'Phase (unwrapped)', delay: 'Group delay', vswr: 'VSWR' }

/** The Response plot: the chosen traces as the chosen quantity (VSWR only for reflections). */
export function responsePlot(result: SolvedData, traces: readonly string[], quantity: Quantity): ShownPlot {
  const unit = QUANTITY_UNITS[quantity]
  const phase = quantity === 'phase' || quantity === 'unwrapped'
  const series: ShownSeries[] = traces.flatMap((name, n) => {
    const t = parseTraceName(name, result.ports)
    if (!t || (quantity === 'vswr' && t.i !== t.j)) return []
    return [{ label: name, unit, values: traceQuantity(result, t, quantity), colour: traceColour(n), dash: phase ? PHASE_DASH : undefined, scale: 'y' as const }]
  })
  return { title: `Response: ${QUANTITY_TITLES[quantity]}`, x: result.frequencies, series, yUnit: unit, yRange: responseAxisRange(quantity, series.map(s => s.values)) }
}

/** The Balance plot of two transmissions ("S21", "S31") against targets; null when either does not fit the result. */
export function balancePlot(result: SolvedData, a: string, b: string, targetDb: number, targetDeg: number, guideColour: string): ShownPlot | null {
  const ta = parseTraceName(a, result.ports)
  const tb = parseTraceName(b, result.ports)
  if (!ta || !tb) return null
  const pair = balance(result, ta, tb)
  const n = result.frequencies.length
  return {
    title: `Balance: ${a} against ${b}`,
    x: result.frequencies,
    series: [
      { label: `${a} − ${b}`, unit: 'dB', values: pair.db, colour: traceColour(0), scale: 'y' },
      { label: `∠${a} − ∠${b}`, unit: '°', values: pair.deg, colour: traceColour(1), dash: PHASE_DASH, scale: 'y2' },
      { label: 'amplitude target', unit: 'dB', values: new Float64Array(n).fill(targetDb), colour: guideColour, dash: [2, 3], scale: 'y', guide: true },
      { label: 'phase target', unit: '°', values: new Float64Array(n).fill(targetDeg), colour: guideColour, dash: [8, 3, 2, 3], scale: 'y2', guide: true },
    ],
    yUnit: 'dB',
    yRange: balanceAxisRange(pair.db, targetDb, BALANCE_DB_HALF_SPAN),
    y2Unit: '°',
    y2Range: balanceAxisRange(pair.deg, targetDeg, BALANCE_DEG_HALF_SPAN),
  }
}
