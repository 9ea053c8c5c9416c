import { z } from 'zod'
import { AccountSession } from '~~/server/database/models'

/**
 * Ends one session of the signed-in account (a lost laptop, a shared computer). Another account's session answers
 * 404 like a missing one. Ending the current session also clears this browser's cookie.
 */
export default defineEventHandler(async (event) => {
  const { user, session } = await requireCurrentSession(event)
  const { sessionId } = paramsAs(event, z.object({ sessionId: z.uuid() }))
  const [revoked] = await AccountSession.update({ revokedAt: new Date() }, { where: { id: sessionId, userId: user.id, revokedAt: null } })
  if (!revoked) throw createError({ statusCode: 404, message: 'That session was not found; it may have ended already.' })
  const current = sessionId === session.id
  if (current) await clearUserSession(event)
  await liveSessionsChanged()
  await recordAudit('account.session-revoked', user.id, null, { sessionId, current })
  return { revoked: true, current }
})
