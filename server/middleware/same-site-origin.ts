/**
 * Refuses state-changing API requests that a browser sent from another site.
 * Non-browser clients send neither header and are allowed; the session cookie
 * (sameSite=lax) is the second line of defence. Automation requests (`/api/v1/`
 * with a bearer token and no cookie) carry no ambient credential a page could
 * borrow, so they pass from anywhere; the v1 routes accept nothing but the token.
 */
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS'])

export default defineEventHandler((event) => {
  if (SAFE_METHODS.has(event.method) || !event.path.startsWith('/api/')) return
  if (isBearerAutomation(event)) return
  const origin = getHeader(event, 'origin')
  const fetchSite = getHeader(event, 'sec-fetch-site')
  if (origin) {
    if (!isSameOrigin(origin, requestHost(event))) {
      throw createError({ statusCode: 403, message: `Request refused: origin ${origin} is not this site.` })
    }
    return
  }
  if (fetchSite === 'cross-site') {
    throw createError({ statusCode: 403, message: 'Request refused: it came from another site.' })
  }
})

function requestHost(event: Parameters<typeof getRequestHost>[0]): string {
  return getRequestHost(event, { xForwardedHost: trustProxy() })
}

function isSameOrigin(origin: string, host: string): boolean {
  try {
    return new URL(origin).host === host
  } catch {
    return false
  }
}

function isBearerAutomation(event: Parameters<typeof getRequestHost>[0]): boolean {
  return event.path.startsWith('/api/v1/')
    && /^Bearer\s/i.test(getHeader(event, 'authorization') ?? '')
    && !getHeader(event, 'cookie')
}
