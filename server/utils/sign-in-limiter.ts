import type { H3Event } from 'h3'
import { createHash } from 'node:crypto'
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible'

/** Failed sign-ins allowed per account and per address within the window. */
const WINDOW_SECONDS = 15 * 60
const limits = () => ({
  perAccount: Number(process.env.PORTWRIGHT_SIGNIN_LIMIT_ACCOUNT ?? 5),
  perAddress: Number(process.env.PORTWRIGHT_SIGNIN_LIMIT_ADDRESS ?? 30),
})

let limiters: { account: RateLimiterPostgres; address: RateLimiterPostgres } | undefined

function useLimiters() {
  if (!limiters) {
    const storeClient = useDatabase()
    const common = { storeClient, storeType: 'sequelize', tableName: 'rate_limits', tableCreated: true, duration: WINDOW_SECONDS }
    limiters = {
      account: new RateLimiterPostgres({ ...common, keyPrefix: 'signin-account', points: limits().perAccount }),
      address: new RateLimiterPostgres({ ...common, keyPrefix: 'signin-address', points: limits().perAddress }),
    }
  }
  return limiters
}

/** The client's address; X-Forwarded-For is honoured only behind a trusted proxy. */
export function clientAddress(event: H3Event): string {
  return getRequestIP(event, { xForwardedFor: trustProxy() }) ?? 'unknown'
}

/** Refuses with 429 when the account or the address has used up its failed attempts. */
export async function assertSignInAllowed(email: string, address: string): Promise<void> {
  const { account, address: byAddress } = useLimiters()
  const [a, b] = await Promise.all([account.get(key(email)), byAddress.get(key(address))])
  const blocked = [a, b].filter((r): r is RateLimiterRes => !!r && r.remainingPoints <= 0)
  if (blocked.length) {
    const wait = Math.ceil(Math.max(...blocked.map(r => r.msBeforeNext)) / 60_000)
    throw createError({ statusCode: 429, message: `Too many failed sign-in attempts. Try again in ${wait} minute${wait === 1 ? '' : 's'}.` })
  }
}

/** Counts one failed attempt against both the account and the address. */
export async function recordFailedSignIn(email: string, address: string): Promise<void> {
  const { account, address: byAddress } = useLimiters()
  await Promise.all([
    account.penalty(key(email), 1),
    byAddress.penalty(key(address), 1),
  ])
}

/** A successful sign-in clears the account's count (not the address's). */
export async function clearAccountFailures(email: string): Promise<void> {
  await useLimiters().account.delete(key(email))
}

/** Fixed-length keys: the limiter table's key column is 255 characters. */
function key(value: string): string {
  return createHash('sha256').update(value.toLowerCase()).digest('hex')
}
