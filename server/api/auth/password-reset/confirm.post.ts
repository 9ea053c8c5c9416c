import { Op } from 'sequelize'
import { passwordResetSchema } from '#shared/schemas/auth'
import { AccountSession, PasswordReset, User } from '~~/server/database/models'
import { passwordChangedMail } from '~~/server/mail/messages'

/**
 * Sets a new password from a reset link. The link is claimed with one conditional UPDATE (unused, not expired),
 * so it works once even when two tabs race; in the same transaction the password changes, every session row of
 * the account is revoked and its session version bumped. The account is then asked to sign in.
 */
export default defineEventHandler(async (event) => {
  const body = await readBodyAs(event, passwordResetSchema)
  const tokenHash = hashSecretToken(body.token)
  const passwordHash = await hashPassword(body.password)
  const now = new Date()
  const user = await useDatabase().transaction(async (transaction) => {
    const [claimed, rows] = await PasswordReset.update(
      { usedAt: now },
      { where: { tokenHash, usedAt: null, expiresAt: { [Op.gt]: now } }, returning: true, transaction },
    )
    if (claimed === 0) return null
    const owner = await User.findByPk(rows[0]!.userId, { transaction, lock: transaction.LOCK.UPDATE })
    if (!owner) return null
    owner.passwordHash = passwordHash
    owner.sessionVersion += 1
    await owner.save({ transaction })
    await AccountSession.update({ revokedAt: now }, { where: { userId: owner.id, revokedAt: null }, transaction })
    return owner
  })
  if (!user) {
    const refusal = resetLinkRefusal(await PasswordReset.findOne({ where: { tokenHash } }))
    throw createError({ statusCode: refusal.status, message: refusal.message })
  }
  await liveSessionsChanged()
  await recordAudit('account.password-reset', user.id, null)
  await sendMail(user.email, passwordChangedMail({ name: user.name, how: 'reset', when: now, resetUrl: appLink(event, '/password-reset') }))
  return { reset: true, email: user.email }
})
