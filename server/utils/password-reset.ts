import type { H3Event } from 'h3'
import { PasswordReset, User } from '~~/server/database/models'
import { passwordResetMail } from '~~/server/mail/messages'

/** How long a reset link works. */
export const PASSWORD_RESET_LIFETIME_MS = 30 * 60 * 1000
/**
 * Every reset request is answered this long after it arrived, whether or not the account exists; the lookup, the
 * link and the mail happen within it (or, on a slow mail relay, after the answer), so the answer time says nothing.
 */
export const PASSWORD_RESET_ANSWER_MS = 700

/** The one answer to every well-formed reset request. */
export const PASSWORD_RESET_ANSWER = 'If an account uses this address, a link to set a new password is on its way to it. The link works once, for 30 minutes. Check your inbox and spam folder; nothing arrives for an address without an account.'

/**
 * Mails a reset link to the account with this address, if there is one: a fresh random token (only its SHA-256 is
 * stored), valid for 30 minutes. Earlier unused links of the account stop working, so only the newest mail counts.
 */
export async function sendPasswordResetLink(event: H3Event, email: string): Promise<void> {
  useDatabase()
  const user = await User.findOne({ where: { email } })
  if (!user) return
  const { token, hash } = newSecretToken()
  // Made and expiry times from one clock reading, so a link lives exactly 30 minutes.
  const createdAt = new Date()
  const expiresAt = new Date(createdAt.getTime() + PASSWORD_RESET_LIFETIME_MS)
  await PasswordReset.destroy({ where: { userId: user.id, usedAt: null } })
  await PasswordReset.create({ userId: user.id, tokenHash: hash, createdAt, expiresAt })
  await sendMail(user.email, passwordResetMail({ name: user.name, url: appLink(event, `/password-reset/${token}`), expiresAt }))
}

/** Why a reset link no longer works, in the user's words. */
export function resetLinkRefusal(row: PasswordReset | null, now = new Date()): { status: number; message: string } {
  if (!row) return { status: 404, message: 'This reset link is not valid. Only the newest link you were sent works; ask for a new one if you need it.' }
  if (row.usedAt) return { status: 410, message: 'This reset link has been used already. Each link works once; ask for a new one if you need it.' }
  if (row.expiresAt.getTime() <= now.getTime()) return { status: 410, message: 'This reset link has expired (links work for 30 minutes). Ask for a new one.' }
  return { status: 409, message: 'This reset link could not be used just now; try again.' }
}
