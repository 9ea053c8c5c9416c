/**
 * A frequency plot as a standalone SVG document: axes with ticks and units, grid, the traces
 * (solid magnitude, dashed phase), a title and a legend. Pure string work, so the same picture
 * serves the SVG export and the printable report.
 */
import { formatTick } from '~~/app/utils/editor/format'
import { frequencyTickLabel, logTicks } from '~~/app/utils/editor/logAxis'
import type { AxisRange } from '~~/app/utils/editor/plotRange'
import { linearTicks } from './linearTicks'
import type { ShownPlot } from './shownPlot'

/** Size, axis kind and colours of the picture. */
export interface PlotSvgOptions {
  width?: number
  height?: number
  /** Logarithmic frequency axis. */
  log?: boolean
  /** Text and axis colour, grid colour, background. */
  ink?: string
  grid?: string
  background?: string
  /** A line of small print under the legend (the simulated-results caution of an exported picture). */
  footnote?: string
  /** Prefix of the picture's element ids, unique per page when several plots share one. @default 'plot' */
  idPrefix?: string
}

// The product's slate ink and laminate-paper grid, as files exported alone cannot read the app's tokens.
const INK = 'rgb(31, 42, 51)'
const GRID = 'rgb(221, 214, 200)'
const FONT = 'Inter, system-ui, sans-serif'

/** Text made safe inside SVG markup. */
export function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;')
}

const r2 = (v: number) => Math.round(v * 100) / 100

/** " (dB)", " (°, right axis)", " (right axis)" for a unitless trace on a two-axis plot. */
function legendUnit(unit: string, scale?: 'y' | 'y2'): string {
  const side = scale ? (scale === 'y2' ? 'right axis' : 'left axis') : ''
  const parts = [unit, side].filter(Boolean)
  return parts.length ? ` (${parts.join(', ')})` : ''
}

/** Finite extent of the series on one axis; a unit span around a single value. */
function extent(plot: ShownPlot, scale: 'y' | 'y2'): AxisRange {
  let lo = Infinity, hi = -Infinity
  for (const s of plot.series) {
    if (s.scale !== scale) continue
    for (const v of s.values) if (Number.isFinite(v)) { lo = Math.min(lo, v); hi = Math.max(hi, v) }
  }
  if (!(lo <= hi)) return { min: 0, max: 1 }
  if (hi === lo) return { min: lo - 1, max: hi + 1 }
  const pad = (hi - lo) * 0.05
  return { min: lo - pad, max: hi + pad }
}

/** SVG path data of one trace: breaks at gaps, values beyond the axis drawn on its edge. */
export function tracePath(x: ArrayLike<number>, values: ArrayLike<number>, toX: (f: number) => number, range: AxisRange, toY: (v: number) => number): string {
  const parts: string[] = []
  let pen = false
  for (let k = 0; k < values.length; k++) {
    const v = values[k]!
    if (Number.isNaN(v)) { pen = false; continue }
    const y = toY(Math.min(range.max, Math.max(range.min, v)))
    parts.push(`${pen ? 'L' : 'M'}${r2(toX(x[k]!))} ${r2(y)}`)
    pen = true
  }
  return parts.join('')
}

/** The plot as an SVG document (UTF-8 text). */
export function plotSvg(plot: ShownPlot, options: PlotSvgOptions = {}): string {
  const width = options.width ?? 800
  const height = options.height ?? 420
  const ink = options.ink ?? INK
  const grid = options.grid ?? GRID
  const hasY2 = plot.y2Unit !== undefined && plot.series.some(s => s.scale === 'y2')
  const legend = plot.series.map(s => s.label + legendUnit(s.unit, hasY2 ? s.scale : undefined))
  // As many legend columns as the longest entry leaves room for (about 6 px a character at 11 px), at most four.
  const longest = Math.max(1, ...legend.map(t => t.length))
  const columns = Math.max(1, Math.min(4, Math.floor((width - 84) / (36 + longest * 6))))
  const legendRows = Math.ceil(plot.series.length / columns)
  const footRoom = options.footnote ? 18 : 0
  const box = { left: 64, right: width - (hasY2 ? 64 : 20), top: 30, bottom: height - 40 - legendRows * 16 - footRoom }
  const f0 = plot.x[0] ?? 0
  const f1 = plot.x[plot.x.length - 1] ?? 1
  const [xMin, xMax] = f1 > f0 ? [f0, f1] : [f0 * 0.9 || -1, f0 * 1.1 || 1]
  const log = !!options.log && xMin > 0
  const toX = (f: number) => box.left + (box.right - box.left) * (log ? Math.log(f / xMin) / Math.log(xMax / xMin) : (f - xMin) / (xMax - xMin))
  const yRange = plot.yRange ?? extent(plot, 'y')
  const y2Range = plot.y2Range ?? extent(plot, 'y2')
  const toYOf = (r: AxisRange) => (v: number) => box.bottom - (box.bottom - box.top) * (v - r.min) / (r.max - r.min)
  const clipId = `${options.idPrefix ?? 'plot'}-area`
  const out: string[] = []
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="${FONT}" font-size="11">`)
  out.push(`<title>${escapeXml(plot.title)}</title>`)
  out.push(`<rect width="${width}" height="${height}" fill="${options.background ?? 'white'}"/>`)
  out.push(`<text x="${box.left}" y="18" fill="${ink}" font-size="13" font-weight="600">${escapeXml(plot.title)}</text>`)
  out.push(`<defs><clipPath id="${clipId}"><rect x="${box.left}" y="${box.top}" width="${box.right - box.left}" height="${box.bottom - box.top}"/></clipPath></defs>`)

  // Frequency axis.
  const xTicks = log ? logTicks(xMin, xMax) : linearTicks(xMin, xMax, 6).values
  const xStep = log ? 0 : linearTicks(xMin, xMax, 6).step
  for (const f of xTicks) {
    const x = r2(toX(f))
    out.push(`<line x1="${x}" y1="${box.top}" x2="${x}" y2="${box.bottom}" stroke="${grid}"/>`)
    out.push(`<text x="${x}" y="${box.bottom + 15}" fill="${ink}" text-anchor="middle">${escapeXml(log ? frequencyTickLabel(f) : formatTick(f, 'Hz', xStep))}</text>`)
  }
  out.push(`<text x="${(box.left + box.right) / 2}" y="${box.bottom + 30}" fill="${ink}" text-anchor="middle">Frequency</text>`)

  // Value axes: left with grid lines, right (if any) ticks only.
  const yAxis = (range: AxisRange, unit: string, side: 'left' | 'right') => {
    const { values, step } = linearTicks(range.min, range.max, 6)
    const toY = toYOf(range)
    for (const v of values) {
      const y = r2(toY(v))
      if (side === 'left') out.push(`<line x1="${box.left}" y1="${y}" x2="${box.right}" y2="${y}" stroke="${grid}"/>`)
      const x = side === 'left' ? box.left - 6 : box.right + 6
      out.push(`<text x="${x}" y="${y + 4}" fill="${ink}" text-anchor="${side === 'left' ? 'end' : 'start'}">${escapeXml(formatTick(v, unit, step))}</text>`)
    }
  }
  yAxis(yRange, plot.yUnit, 'left')
  if (hasY2) yAxis(y2Range, plot.y2Unit!, 'right')
  out.push(`<rect x="${box.left}" y="${box.top}" width="${box.right - box.left}" height="${box.bottom - box.top}" fill="none" stroke="${ink}" stroke-width="1"/>`)

  // Traces, clipped to the plot area.
  out.push(`<g clip-path="url(#${clipId})" fill="none" stroke-width="1.75" stroke-linejoin="round">`)
  for (const s of plot.series) {
    const range = s.scale === 'y2' ? y2Range : yRange
    const d = tracePath(plot.x, s.values, toX, range, toYOf(range))
    if (!d) continue
    out.push(`<path d="${d}" stroke="${s.colour}"${s.dash ? ` stroke-dasharray="${s.dash.join(' ')}"` : ''}><title>${escapeXml(s.label)}</title></path>`)
  }
  out.push('</g>')

  // Legend under the axis label, in as many columns as fit.
  const column = (box.right - box.left) / columns
  plot.series.forEach((s, n) => {
    const x = box.left + (n % columns) * column
    const y = box.bottom + 46 + Math.floor(n / columns) * 16
    out.push(`<line x1="${x}" y1="${y - 4}" x2="${x + 22}" y2="${y - 4}" stroke="${s.colour}" stroke-width="2"${s.dash ? ` stroke-dasharray="${s.dash.join(' ')}"` : ''}/>`)
    out.push(`<text x="${x + 28}" y="${y}" fill="${ink}">${escapeXml(legend[n]!)}</text>`)
  })
  if (options.footnote) out.push(`<text x="${box.left}" y="${height - 8}" fill="${ink}" font-size="9">${escapeXml(options.footnote)}</text>`)
  out.push('</svg>')
  return `${out.join('\n')}\n`
}
