/**
 * The websocket's gate, run on the upgrade request before any room is opened:
 * a same-site Origin, a valid session (nuxt-auth-utils' sealed cookie, read with
 * its own helper, naming a live row of `sessions`), and the caller's project role read from the database.
 * Anything else is refused with a plain HTTP answer and no websocket.
 */
import { networkMembership } from './store'
import { trustProxy } from '~~/server/utils/trust-proxy'
import { liveSessionFor, sessionSecretOf } from '~~/server/utils/account-sessions'

const PATH = /^\/live\/networks\/([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})\/?$/i

export interface UpgradeRequest {
  url: string
  headers: Headers
  context?: Record<string, unknown>
}

export interface LiveAdmission {
  networkId: string
  projectId: string
  userId: string
  name: string
  role: string
  sessionVersion: number
  /** The session row the upgrade came with: revoking it closes the connection (4401). */
  sessionId: string
}

export type UpgradeVerdict = { ok: true, admission: LiveAdmission } | { ok: false, status: number, message: string }

function sameSite(request: UpgradeRequest): boolean {
  const origin = request.headers.get('origin')
  if (!origin) return false
  const host = (trustProxy() && request.headers.get('x-forwarded-host')) || request.headers.get('host')
  try {
    return !!host && new URL(origin).host === host
  } catch {
    return false
  }
}

async function sessionOf(request: UpgradeRequest): Promise<{ id: string, name: string, version: number, secret: string | null } | null> {
  try {
    // getUserSession reads the cookie from a plain request; without a valid cookie it throws (it may not start a session here).
    const session = await getUserSession(request as unknown as Parameters<typeof getUserSession>[0])
    const user = session.user as { id?: string, name?: string } | undefined
    return user?.id ? { id: user.id, name: user.name ?? '', version: Number(session.version), secret: sessionSecretOf(session) } : null
  } catch {
    return null
  }
}

/** Decides an upgrade: 400 bad path, 403 foreign origin, 401 no session, 404 not a member or no such network. */
export async function admitUpgrade(request: UpgradeRequest): Promise<UpgradeVerdict> {
  const path = new URL(request.url, 'http://localhost').pathname
  const match = PATH.exec(path)
  if (!match) return { ok: false, status: 400, message: 'Not a live network address.' }
  if (!sameSite(request)) return { ok: false, status: 403, message: 'Refused: the connection did not come from this site.' }
  const user = await sessionOf(request)
  if (!user) return { ok: false, status: 401, message: 'Sign in first.' }
  // A cookie without a live session row (signed out, revoked, or made before server-side sessions) is refused.
  const row = await liveSessionFor(user.secret, user.id)
  if (!row) return { ok: false, status: 401, message: 'Your session has ended; please sign in again.' }
  const networkId = match[1]!.toLowerCase()
  const membership = await networkMembership(networkId, user.id)
  if (membership && membership.sessionVersion !== user.version) return { ok: false, status: 401, message: 'Your session has ended; please sign in again.' }
  // Not a member and no such network look the same: the existence of a network is not revealed.
  if (!membership) return { ok: false, status: 404, message: 'Network not found.' }
  return { ok: true, admission: { networkId, projectId: membership.projectId, userId: user.id, name: user.name, role: membership.role, sessionVersion: user.version, sessionId: row.id } }
}
