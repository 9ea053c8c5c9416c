import { describeUserAgent } from '#shared/account/describe-user-agent'
import type { AccountSessionDto } from '#shared/types/api'

/** The signed-in account's live sessions, most recently seen first, marking the one this request came with. */
export default defineEventHandler(async (event): Promise<AccountSessionDto[]> => {
  const { user, session } = await requireCurrentSession(event)
  const rows = await liveSessionsOf(user.id)
  return rows.map(row => ({
    id: row.id,
    device: describeUserAgent(row.userAgent),
    userAgent: row.userAgent,
    createdAt: row.createdAt.toISOString(),
    lastSeenAt: row.lastSeenAt.toISOString(),
    current: row.id === session.id,
  }))
})
