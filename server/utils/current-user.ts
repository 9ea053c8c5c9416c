import type { H3Event } from 'h3'
import { User } from '../database/models'

/**
 * The signed-in user, read fresh from the database on every request. A session
 * whose version no longer matches the user's (signed out everywhere) is cleared
 * and answered 401.
 */
export async function requireCurrentUser(event: H3Event): Promise<User> {
  const session = await requireUserSession(event)
  useDatabase()
  const user = await User.findByPk(session.user.id)
  if (!user || user.sessionVersion !== session.version) {
    await clearUserSession(event)
    throw createError({ statusCode: 401, message: 'Your session has ended; please sign in again.' })
  }
  return user
}
