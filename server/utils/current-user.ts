import type { H3Event } from 'h3'
import type { User } from '~~/server/database/models'

/**
 * The signed-in user, read fresh from the database on every request, with their session row
 * checked (server/utils/account-sessions.ts): a missing, revoked or idle session row, or a
 * session version behind the user's (signed out everywhere), is cleared and answered 401.
 */
export async function requireCurrentUser(event: H3Event): Promise<User> {
  return (await requireCurrentSession(event)).user
}
