/**
 * Canvas-drawn plots need colour strings; they are read from the Tailwind
 * token classes so that the palette stays defined in one place.
 */
const cache = new Map<string, string>()

/** The computed `color` of a token class such as `text-ink-soft`. */
export function tokenColour(className: string): string {
  const hit = cache.get(className)
  if (hit) return hit
  const probe = document.createElement('span')
  probe.className = className
  probe.style.display = 'none'
  document.body.appendChild(probe)
  const colour = getComputedStyle(probe).color
  probe.remove()
  cache.set(className, colour)
  return colour
}
