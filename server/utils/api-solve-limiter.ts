import type { H3Event } from 'h3'
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible'

/**
 * Solves per access token per minute (PORTWRIGHT_API_SOLVE_LIMIT, default 60), counted atomically in PostgreSQL
 * like the sign-in limits, so parallel requests and several app instances share one count.
 */
let limiter: RateLimiterPostgres | undefined

/** The per-minute solve allowance of one token. */
export function apiSolveLimit(): number {
  const value = Number(process.env.PORTWRIGHT_API_SOLVE_LIMIT)
  return Number.isInteger(value) && value > 0 ? value : 60
}

function useLimiter(): RateLimiterPostgres {
  limiter ??= new RateLimiterPostgres({
    storeClient: useDatabase(), storeType: 'sequelize', tableName: 'rate_limits', tableCreated: true,
    keyPrefix: 'api-solve-token', points: apiSolveLimit(), duration: 60,
  })
  return limiter
}

/** Takes one solve from the token's allowance; 429 with Retry-After (seconds) when it is used up. */
export async function reserveApiSolve(event: H3Event, tokenId: string): Promise<void> {
  try {
    await useLimiter().consume(tokenId)
  } catch (error) {
    if (!(error instanceof RateLimiterRes)) throw error
    const seconds = Math.max(1, Math.ceil(error.msBeforeNext / 1000))
    setResponseHeader(event, 'Retry-After', seconds)
    throw createError({ statusCode: 429, message: `This token has used its ${apiSolveLimit()} solves for this minute. Try again in ${seconds} s.` })
  }
}
