import { passwordChangeSchema } from '#shared/schemas/auth'
import { passwordChangedMail } from '~~/server/mail/messages'

/**
 * Changes the signed-in account's password. The current password is checked under the sign-in limits (a limiter
 * point is taken first), so a borrowed session cannot be used to guess it. Every other session of the account
 * ends; this one stays. A notice is mailed to the account's address.
 */
export default defineEventHandler(async (event) => {
  const { user, session } = await requireCurrentSession(event)
  const body = await readBodyAs(event, passwordChangeSchema)
  const address = clientAddress(event)
  await reserveSignInAttempt(user.email, address)
  if (!await verifyPassword(user.passwordHash, body.currentPassword)) {
    const message = 'The current password is wrong.'
    throw createError({ statusCode: 403, message, data: { fields: { currentPassword: message } } })
  }
  await signInSucceeded(user.email, address)
  user.passwordHash = await hashPassword(body.newPassword)
  await user.save()
  const ended = await revokeSessionsOf(user.id, session.id)
  await liveSessionsChanged()
  await recordAudit('account.password-changed', user.id, null, { otherSessionsEnded: ended })
  await sendMail(user.email, passwordChangedMail({ name: user.name, how: 'changed', when: new Date(), resetUrl: appLink(event, '/password-reset') }))
  return { changed: true, otherSessionsEnded: ended }
})
