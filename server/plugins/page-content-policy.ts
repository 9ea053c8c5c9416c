import { createHash } from 'node:crypto'

/**
 * The content security policy of rendered pages. Scripts load only from this site, plus the page's own inline
 * scripts (Nuxt's state and configuration), allowed by their SHA-256 hashes rather than by 'unsafe-inline'.
 * Styles may be inline: the canvas and the plots position elements with style attributes. The websocket and
 * the solve worker are same-origin.
 */
const INLINE_SCRIPT = /<script(?![^>]*\bsrc=)(?![^>]*type="application\/json")[^>]*>([\s\S]*?)<\/script>/g

export function pagePolicy(html: string): string {
  const hashes = new Set<string>()
  for (const match of html.matchAll(INLINE_SCRIPT)) {
    if (match[1]) hashes.add(`'sha256-${createHash('sha256').update(match[1], 'utf8').digest('base64')}'`)
  }
  return [
    "default-src 'self'",
    `script-src 'self' ${[...hashes].join(' ')}`.trim(),
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ')
}

export default defineNitroPlugin((nitroApp) => {
  nitroApp.hooks.hook('render:response', (response) => {
    if (typeof response.body !== 'string') return
    response.headers = { ...response.headers, 'content-security-policy': pagePolicy(response.body) }
  })
})
