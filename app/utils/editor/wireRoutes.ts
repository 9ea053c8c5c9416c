/**
 * Wire routes kept in the document under `view.routes` (our own key; the
 * contract keeps unknown keys). Read defensively: a document may be hostile.
 */
import type { NetworkDocument } from '~~/shared/network/types'

/** Stored wire routes: wire key → corner points from the first terminal of the wire (as written) to the second. */
export type WireRoutes = Record<string, Array<[number, number]>>

/** The stored route of a wire, if the document has one. */
export function storedRoute(doc: NetworkDocument, key: string): Array<[number, number]> | undefined {
  const routes = (doc as { view?: { routes?: unknown } }).view?.routes
  if (!routes || typeof routes !== 'object') return undefined
  const route = (routes as Record<string, unknown>)[key]
  if (!Array.isArray(route) || route.length < 2 || route.length > 64) return undefined
  return route.every(p => Array.isArray(p) && p.length === 2 && p.every(Number.isFinite)) ? route as Array<[number, number]> : undefined
}
