import type { H3Event } from 'h3'
import { createHash } from 'node:crypto'
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible'

/**
 * Sign-in and sign-up limits (OWASP ASVS 5.0, V6: anti-automation). A point is taken before the password is
 * checked, atomically in PostgreSQL, so N parallel guesses cost N points. Failures are counted per account and
 * address pair (a stranger elsewhere cannot lock a person out), under a higher ceiling for the account as a whole,
 * and per address.
 */
const WINDOW_SECONDS = 15 * 60
const SIGNUP_WINDOW_SECONDS = 60 * 60

const envNumber = (name: string, fallback: number): number => {
  const value = Number(process.env[name])
  return Number.isFinite(value) && value > 0 ? value : fallback
}
const limits = () => ({
  perPair: envNumber('PORTWRIGHT_SIGNIN_LIMIT_ACCOUNT', 5),
  perAccount: envNumber('PORTWRIGHT_SIGNIN_LIMIT_ACCOUNT_TOTAL', 50),
  perAddress: envNumber('PORTWRIGHT_SIGNIN_LIMIT_ADDRESS', 30),
  signUps: envNumber('PORTWRIGHT_SIGNUP_LIMIT_ADDRESS', 10),
  resetsPerAddress: envNumber('PORTWRIGHT_RESET_LIMIT_ADDRESS', 10),
  resetsPerAccount: envNumber('PORTWRIGHT_RESET_LIMIT_ACCOUNT', 3),
})

interface Limiters {
  pair: RateLimiterPostgres; account: RateLimiterPostgres; address: RateLimiterPostgres; signUp: RateLimiterPostgres
  resetAddress: RateLimiterPostgres; resetAccount: RateLimiterPostgres
}
let limiters: Limiters | undefined

function useLimiters(): Limiters {
  if (!limiters) {
    const storeClient = useDatabase()
    const common = { storeClient, storeType: 'sequelize', tableName: 'rate_limits', tableCreated: true, duration: WINDOW_SECONDS }
    const l = limits()
    limiters = {
      pair: new RateLimiterPostgres({ ...common, keyPrefix: 'signin-pair', points: l.perPair }),
      account: new RateLimiterPostgres({ ...common, keyPrefix: 'signin-account-total', points: l.perAccount }),
      address: new RateLimiterPostgres({ ...common, keyPrefix: 'signin-address', points: l.perAddress }),
      signUp: new RateLimiterPostgres({ ...common, keyPrefix: 'signup-address', points: l.signUps, duration: SIGNUP_WINDOW_SECONDS }),
      resetAddress: new RateLimiterPostgres({ ...common, keyPrefix: 'reset-address', points: l.resetsPerAddress, duration: SIGNUP_WINDOW_SECONDS }),
      resetAccount: new RateLimiterPostgres({ ...common, keyPrefix: 'reset-account', points: l.resetsPerAccount, duration: SIGNUP_WINDOW_SECONDS }),
    }
  }
  return limiters
}

/**
 * The client's address. Behind a trusted proxy it is the rightmost X-Forwarded-For entry: the one the proxy
 * itself added; entries to its left come from the client and can be anything.
 */
export function clientAddress(event: H3Event): string {
  if (trustProxy()) {
    const forwarded = getRequestHeader(event, 'x-forwarded-for')
    const rightmost = forwarded?.split(',').map(s => s.trim()).filter(Boolean).at(-1)
    if (rightmost) return rightmost.slice(0, 64)
  }
  return getRequestIP(event) ?? 'unknown'
}

function tooMany(results: unknown[], what: string) {
  const waits = results.filter((r): r is RateLimiterRes => r instanceof RateLimiterRes).map(r => r.msBeforeNext)
  const wait = Math.max(1, Math.ceil(Math.max(0, ...waits) / 60_000))
  return createError({ statusCode: 429, message: `${what} Try again in ${wait} minute${wait === 1 ? '' : 's'}.` })
}

/** Consumes one point for the pair, the account and the address, before anything else; 429 when any is used up. */
export async function reserveSignInAttempt(email: string, address: string): Promise<void> {
  const { pair, account, address: byAddress } = useLimiters()
  const outcomes = await Promise.allSettled([pair.consume(key(`${email} ${address}`)), account.consume(key(email)), byAddress.consume(key(address))])
  const refused = outcomes.filter((o): o is PromiseRejectedResult => o.status === 'rejected')
  if (!refused.length) return
  const unexpected = refused.find(o => !(o.reason instanceof RateLimiterRes))
  if (unexpected) throw unexpected.reason
  throw tooMany(refused.map(o => o.reason), 'Too many failed sign-in attempts.')
}

/** A successful sign-in gives its point back and clears the pair's failures. */
export async function signInSucceeded(email: string, address: string): Promise<void> {
  const { pair, account, address: byAddress } = useLimiters()
  await Promise.all([pair.delete(key(`${email} ${address}`)), account.reward(key(email), 1), byAddress.reward(key(address), 1)])
}

/** Consumes one sign-up from the address; 429 past the hourly limit. */
export async function reserveSignUp(address: string): Promise<void> {
  try {
    await useLimiters().signUp.consume(key(address))
  } catch (error) {
    if (error instanceof RateLimiterRes) throw tooMany([error], 'Too many accounts were created from your address.')
    throw error
  }
}

/** Consumes one password-reset request from the client address; 429 past the hourly limit. */
export async function reservePasswordResetRequest(address: string): Promise<void> {
  try {
    await useLimiters().resetAddress.consume(key(address))
  } catch (error) {
    if (error instanceof RateLimiterRes) throw tooMany([error], 'Too many password-reset requests came from your address.')
    throw error
  }
}

/**
 * Takes one reset mail from the account's hourly allowance, whether or not the account exists; false once it is
 * used up. The caller then sends nothing but answers as always, so the limit neither floods a mailbox nor tells
 * anyone which addresses have accounts.
 */
export async function takePasswordResetMail(email: string): Promise<boolean> {
  try {
    await useLimiters().resetAccount.consume(key(email))
    return true
  } catch (error) {
    if (error instanceof RateLimiterRes) return false
    throw error
  }
}

/** Fixed-length keys: the limiter table's key column is 255 characters. */
function key(value: string): string {
  return createHash('sha256').update(value.toLowerCase()).digest('hex')
}
