/**
 * Markers saved with the network, under a document key of the editor's own:
 * `view: { markers: [{ frequency }] }` (the contract keeps unknown keys). What
 * is read back is checked, because a document may come from anyone.
 */
import type { NetworkDocument } from '~~/shared/network/types'

/** Most markers kept in a document. */
export const MAX_SAVED_MARKERS = 16

/** Frequencies (Hz) of the saved markers, or null when the document keeps none. */
export function savedMarkerFrequencies(doc: NetworkDocument): number[] | null {
  const view = doc.view as { markers?: unknown } | undefined
  if (!view || typeof view !== 'object' || !Array.isArray(view.markers)) return null
  return view.markers
    .map(m => (m && typeof m === 'object' ? (m as { frequency?: unknown }).frequency : undefined))
    .filter((f): f is number => typeof f === 'number' && Number.isFinite(f) && f >= 0)
    .slice(0, MAX_SAVED_MARKERS)
}

/** Write the markers into a document draft, keeping any other view keys. */
export function saveMarkers(draft: NetworkDocument, frequencies: readonly number[]): void {
  const view = draft.view && typeof draft.view === 'object' ? draft.view as Record<string, unknown> : {}
  draft.view = { ...view, markers: frequencies.slice(0, MAX_SAVED_MARKERS).map(frequency => ({ frequency })) }
}

/** Same frequencies in the same order. */
export function sameFrequencies(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((f, k) => f === b[k])
}
