import type { SolvedData } from '~~/app/workers/protocol'
import type { PlotSeries } from '~~/app/utils/editor/plotTypes'
import { traceColour } from '~~/app/utils/editor/tracePalette'
import { parseTraceName, traceQuantity, type Quantity } from '~~/app/utils/editor/traces'

/** The same colour, faded: the "before" side of a comparison keeps its trace's colour but steps back. */
export function faded(colour: string): string {
  return colour.replace(/^rgb\((.*)\)$/, 'rgba($1, 0.4)')
}

/**
 * Series for two responses on one frequency grid: each trace once as before (faded) and
 * once as after (full), in the trace's own palette colour. Magnitude stays solid, so the
 * dash keeps meaning "phase" as everywhere else.
 */
export function overlaySeries(before: SolvedData, after: SolvedData, traces: string[], quantity: Quantity, dash?: readonly number[]): PlotSeries[] {
  return traces.flatMap((name, n) => {
    const tb = parseTraceName(name, before.ports)
    const ta = parseTraceName(name, after.ports)
    const colour = traceColour(n)
    return [
      ...(tb ? [{ label: `${name} before`, values: traceQuantity(before, tb, quantity), colour: faded(colour), dash }] : []),
      ...(ta ? [{ label: `${name} after`, values: traceQuantity(after, ta, quantity), colour, dash }] : []),
    ]
  })
}
