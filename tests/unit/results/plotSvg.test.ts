import { describe, expect, it } from 'vitest'
import { escapeXml, plotSvg, tracePath } from '../../../app/utils/results/plotSvg'
import { linearTicks } from '../../../app/utils/results/linearTicks'
import type { ShownPlot } from '../../../app/utils/results/shownPlot'

const plot = (over: Partial<ShownPlot> = {}): ShownPlot => ({
  title: 'Response: Magnitude <dB>',
  x: new Float64Array([1e9, 2e9, 3e9]),
  series: [
    { label: 'S11', unit: 'dB', values: new Float64Array([-10, -30, -10]), colour: 'rgb(230, 159, 0)', scale: 'y' },
    { label: 'S21', unit: 'dB', values: new Float64Array([-3.5, -3, Number.NaN]), colour: 'rgb(86, 180, 233)', dash: [6, 4], scale: 'y' },
  ],
  yUnit: 'dB',
  yRange: { min: -40, max: 0 },
  ...over,
})

describe('plot as SVG', () => {
  it('ticks step 1-2-2.5-5 and cover the span (common practice for axis labels)', () => {
    expect(linearTicks(-40, 0, 6)).toEqual({ values: [-40, -30, -20, -10, 0], step: 10 })
    expect(linearTicks(1e9, 3e9, 6)).toEqual({ values: [1e9, 1.5e9, 2e9, 2.5e9, 3e9], step: 5e8 })
    expect(linearTicks(0, 1, 4).step).toBe(0.25)
    expect(linearTicks(5, 5).values).toEqual([5])
  })

  it('maps the ends of the sweep and the axis to the plot box, breaking the trace at a gap', () => {
    // A 100×100 box: f 1–3 GHz across, −40…0 dB upwards.
    const toX = (f: number) => (f - 1e9) / 2e9 * 100
    const toY = (v: number) => 100 - (v + 40) / 40 * 100
    expect(tracePath([1e9, 2e9, 3e9], [0, Number.NaN, -40], toX, { min: -40, max: 0 }, toY)).toBe('M0 0M100 100')
    // Beyond the axis the trace runs along its edge.
    expect(tracePath([1e9, 3e9], [-90, 10], toX, { min: -40, max: 0 }, toY)).toBe('M0 100L100 0')
  })

  it('is a standalone SVG document with title, axes with units, legend and one path per trace', () => {
    const svg = plotSvg(plot(), { width: 600, height: 300 })
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg" width="600" height="300"')).toBe(true)
    expect(svg).toContain('<title>Response: Magnitude &lt;dB&gt;</title>')
    expect(svg.match(/<path /g)).toHaveLength(2)
    expect(svg).toContain('clip-path="url(#plot-area)"')
    expect(plotSvg(plot(), { idPrefix: 'balance' })).toContain('<clipPath id="balance-area">')
    expect(svg).toContain('stroke-dasharray="6 4"')
    expect(svg).toContain('>−20 dB<')
    expect(svg).toContain('>2.00 GHz<')
    expect(svg).toContain('>S21 (dB)<')
    expect(svg.trim().endsWith('</svg>')).toBe(true)
    // Every opened element is closed: as many "<x" openings (not self-closed) as "</x>".
    const opened = (svg.match(/<(?!\/)[a-zA-Z][^>]*[^/]>/g) ?? []).length
    const closed = (svg.match(/<\/[a-zA-Z]+>/g) ?? []).length
    expect(opened).toBe(closed)
  })

  it('draws a right-hand axis for a second scale and a log frequency axis with decade ticks', () => {
    const two = plot({
      series: [{ label: '∠S21 − ∠S31', unit: '°', values: new Float64Array([88, 90, 92]), colour: 'red', scale: 'y2' }],
      y2Unit: '°', y2Range: { min: 85, max: 95 }, x: new Float64Array([1e6, 1e7, 1e8]),
    })
    const svg = plotSvg(two, { log: true })
    expect(svg).toContain('text-anchor="start">90°<')
    expect(svg).toContain('>10 MHz<')
    expect(svg).toContain('(°, right axis)')
  })

  it('writes a footnote (the caution of an exported picture) only when asked', () => {
    expect(plotSvg(plot(), { footnote: 'Simulated & checked' })).toContain('font-size="9">Simulated &amp; checked</text>')
    expect(plotSvg(plot())).not.toContain('font-size="9"')
  })

  it('escapes markup in labels', () => {
    expect(escapeXml('a<b & "c">')).toBe('a&lt;b &amp; &quot;c&quot;&gt;')
  })
})
