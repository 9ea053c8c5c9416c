/**
 * Plot trace colours: the colour-blind-safe qualitative palette of Okabe & Ito,
 * "Color Universal Design" (2008), in their fixed order (black left out: it
 * is the ink colour of axes). Traces take colours in this order; magnitude
 * traces are solid, phase traces dashed.
 */
export const TRACE_COLOURS = [
  'rgb(230, 159, 0)', // orange
  'rgb(86, 180, 233)', // sky blue
  'rgb(0, 158, 115)', // bluish green
  'rgb(0, 114, 178)', // blue
  'rgb(213, 94, 0)', // vermillion
  'rgb(204, 121, 167)', // reddish purple
  'rgb(240, 228, 66)', // yellow
] as const

/** Dash pattern for phase traces (magnitude traces are solid). */
export const PHASE_DASH = [6, 4] as const

/** Colour of the n-th trace (0-based), cycling through the palette. */
export function traceColour(n: number): string {
  return TRACE_COLOURS[((n % TRACE_COLOURS.length) + TRACE_COLOURS.length) % TRACE_COLOURS.length]!
}

/** A palette colour (`rgb(r, g, b)`) made translucent, for shaded bands; other colour forms pass unchanged. */
export function withAlpha(colour: string, alpha: number): string {
  const match = /^rgb\((\d+),\s*(\d+),\s*(\d+)\)$/.exec(colour)
  return match ? `rgba(${match[1]}, ${match[2]}, ${match[3]}, ${alpha})` : colour
}
