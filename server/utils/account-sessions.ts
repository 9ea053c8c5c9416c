import type { H3Event } from 'h3'
import { Op } from 'sequelize'
import { AccountSession, PasswordReset, User } from '~~/server/database/models'
import { useDatabase } from './database'
import { hashSecretToken, newSecretToken } from './secret-token'

/**
 * Server-side sessions (OWASP ASVS 5.0, V7 session management). The sealed cookie carries identity, the user's
 * session version and `secure.sid` (never sent to the page), a random secret whose SHA-256 names a row of `sessions`. Every request checks that
 * row, so signing out, revoking one session from the account page, a password change or a reset ends a session
 * on the server, whatever the browser still holds.
 */

/** Sessions not seen for this long have ended (the cookie's own lifetime, runtimeConfig.session.maxAge). */
export const SESSION_IDLE_LIMIT_MS = 7 * 24 * 60 * 60 * 1000
/** Last-seen times are written at most this often, so ordinary requests cost no write. */
const LAST_SEEN_STEP_MS = 60 * 1000
/** Revoked or idle session rows, and used or expired reset links, are deleted after this long. */
export const ACCOUNT_ROW_RETENTION_MS = 30 * 24 * 60 * 60 * 1000
const USER_AGENT_LENGTH = 200
const SESSION_ENDED = 'Your session has ended; please sign in again.'

export interface CurrentSession {
  user: User
  session: AccountSession
}

/** The sid secret of a session's data, if it has one (cookies from before server-side sessions do not). */
export function sessionSecretOf(data: { secure?: { sid?: unknown } } | null | undefined): string | null {
  const sid = data?.secure?.sid
  return typeof sid === 'string' && sid ? sid : null
}

/** Revokes the session row a cookie's sid names, if it is still live; called whenever a cookie is cleared. */
export async function revokeSessionBySecret(secret: string | null): Promise<void> {
  if (!secret) return
  useDatabase()
  await AccountSession.update({ revokedAt: new Date() }, { where: { tokenHash: hashSecretToken(secret), revokedAt: null } })
}

/**
 * Signs `user` in on this browser: a new session row, and a fresh cookie that names it. A session the browser
 * held before is revoked first, so no earlier cookie stays valid beside the new one.
 */
export async function startAccountSession(event: H3Event, user: User): Promise<AccountSession> {
  await revokeSessionBySecret(sessionSecretOf(await getUserSession(event)))
  const { token, hash } = newSecretToken()
  const userAgent = (getRequestHeader(event, 'user-agent') ?? '').replace(/[\u0000-\u001f\u007f]/g, ' ').slice(0, USER_AGENT_LENGTH)
  const row = await AccountSession.create({ userId: user.id, tokenHash: hash, userAgent })
  await replaceUserSession(event, { user: { id: user.id, email: user.email, name: user.name }, version: user.sessionVersion, secure: { sid: token } })
  purgeOldAccountRows()
  return row
}

/** Whether a session row still lets its holder in. */
export function sessionRowLive(row: Pick<AccountSession, 'revokedAt' | 'lastSeenAt'>, now = Date.now()): boolean {
  return !row.revokedAt && now - row.lastSeenAt.getTime() < SESSION_IDLE_LIMIT_MS
}

/**
 * The signed-in user and their session row, read fresh from the database on every request. A cookie without a
 * session row (made before server-side sessions), whose row is revoked or idle, or whose version is behind the
 * user's (signed out everywhere) is cleared and answered 401.
 */
export async function requireCurrentSession(event: H3Event): Promise<CurrentSession> {
  const data = await requireUserSession(event)
  const secret = sessionSecretOf(data)
  useDatabase()
  const session = secret ? await AccountSession.findOne({ where: { tokenHash: hashSecretToken(secret) } }) : null
  const user = session && session.userId === data.user.id && sessionRowLive(session) ? await User.findByPk(session.userId) : null
  if (!session || !user || user.sessionVersion !== data.version) {
    await clearUserSession(event)
    throw createError({ statusCode: 401, message: SESSION_ENDED })
  }
  const now = new Date()
  if (now.getTime() - session.lastSeenAt.getTime() >= LAST_SEEN_STEP_MS) {
    // Conditional, so parallel requests of one browser write once.
    await AccountSession.update({ lastSeenAt: now }, { where: { id: session.id, lastSeenAt: { [Op.lt]: new Date(now.getTime() - LAST_SEEN_STEP_MS) } } })
    session.lastSeenAt = now
  }
  return { user, session }
}

/** Revokes every live session row of a user, but `keepSessionId` when given; returns how many ended. */
export async function revokeSessionsOf(userId: string, keepSessionId?: string): Promise<number> {
  useDatabase()
  const where = { userId, revokedAt: null, ...(keepSessionId ? { id: { [Op.ne]: keepSessionId } } : {}) }
  const [count] = await AccountSession.update({ revokedAt: new Date() }, { where })
  return count
}

/** A user's sessions that still let someone in, most recently seen first. */
export async function liveSessionsOf(userId: string): Promise<AccountSession[]> {
  useDatabase()
  return AccountSession.findAll({
    where: { userId, revokedAt: null, lastSeenAt: { [Op.gt]: new Date(Date.now() - SESSION_IDLE_LIMIT_MS) } },
    order: [['lastSeenAt', 'DESC'], ['createdAt', 'DESC']],
  })
}

/** The live session row named by a cookie's sid for `userId`, or null: the websocket gate's check. */
export async function liveSessionFor(secret: string | null, userId: string): Promise<AccountSession | null> {
  if (!secret) return null
  useDatabase()
  const row = await AccountSession.findOne({ where: { tokenHash: hashSecretToken(secret) } })
  return row && row.userId === userId && sessionRowLive(row) ? row : null
}

let lastPurge = 0

/**
 * Deletes session rows revoked or idle for longer than the retention, and reset links used or expired that long
 * ago; at most once an hour per app instance, in the background of a sign-in.
 */
export function purgeOldAccountRows(now = Date.now()): void {
  if (now - lastPurge < 60 * 60 * 1000) return
  lastPurge = now
  const before = new Date(now - ACCOUNT_ROW_RETENTION_MS)
  Promise.all([
    AccountSession.destroy({ where: { [Op.or]: [{ revokedAt: { [Op.lt]: before } }, { lastSeenAt: { [Op.lt]: before } }] } }),
    PasswordReset.destroy({ where: { [Op.or]: [{ usedAt: { [Op.lt]: before } }, { expiresAt: { [Op.lt]: before } }] } }),
  ]).catch(error => console.warn(`Portwright: purging old session rows failed: ${(error as Error).message}`))
}
