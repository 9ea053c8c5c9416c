import type { H3Event } from 'h3'
import type { User } from '~~/server/database/models'

/**
 * The gate for site-administrator routes. Everyone else gets 404, as for a project they
 * are not in: the pages are not advertised to people who cannot use them.
 */
export async function requireAdmin(event: H3Event): Promise<User> {
  const user = await requireCurrentUser(event)
  if (!user.isAdmin) throw createError({ statusCode: 404, message: 'Not found.' })
  return user
}
