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

type Pt = readonly [number, number]

/** Points along a route one pixel apart (routes are orthogonal with whole-pixel corners). */
function walk(route: readonly Pt[], limit = 20000): string[] {
  const out: string[] = []
  for (let s = 0; s + 1 < route.length && out.length < limit; s++) {
    const [x0, y0] = route[s]!
    const [x1, y1] = route[s + 1]!
    const steps = Math.max(Math.abs(x1 - x0), Math.abs(y1 - y0))
    for (let k = s === 0 ? 0 : 1; k <= steps && out.length < limit; k++) {
      out.push(`${Math.round(x0 + ((x1 - x0) * k) / (steps || 1))},${Math.round(y0 + ((y1 - y0) * k) / (steps || 1))}`)
    }
  }
  return out
}

/**
 * Where routed wires of one terminal part ways after running together: a junction the
 * canvas marks with a dot (the terminal itself already has one). `routes` are keyed by
 * wire key; each route runs from its wire's first terminal to its second.
 */
export function routeJunctions(wires: ReadonlyArray<readonly [string, string]>, routes: Readonly<Record<string, ReadonlyArray<Pt>>>, key: (w: readonly [string, string]) => string): Array<{ at: [number, number], wire: string }> {
  const byTerminal = new Map<string, Array<{ path: string[], wire: string }>>()
  for (const w of wires) {
    const route = routes[key(w)]
    if (!route) continue
    const forward = walk(route)
    for (const [end, path] of [[w[0], forward], [w[1], [...forward].reverse()]] as const) {
      const list = byTerminal.get(end) ?? []
      list.push({ path, wire: key(w) })
      byTerminal.set(end, list)
    }
  }
  const dots = new Map<string, string>()
  for (const paths of byTerminal.values()) {
    for (let i = 0; i < paths.length; i++) {
      for (let j = i + 1; j < paths.length; j++) {
        const a = paths[i]!.path
        const b = paths[j]!.path
        let k = 0
        while (k < a.length && k < b.length && a[k] === b[k]) k++
        // Together for more than the terminal itself, and both go on beyond the parting point.
        if (k > 1 && k < a.length && k < b.length && !dots.has(a[k - 1]!)) dots.set(a[k - 1]!, paths[i]!.wire)
      }
    }
  }
  return [...dots].map(([p, wire]) => ({ at: p.split(',').map(Number) as [number, number], wire }))
}
