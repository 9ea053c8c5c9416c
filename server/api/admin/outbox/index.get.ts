import { OutboxMessage } from '~~/server/database/models'
import type { OutboxMessageBriefDto } from '#shared/types/review'

/** Messages the local stand-in SMTP server received, newest first (site administrators). */
export default defineEventHandler(async (event): Promise<{ local: boolean; messages: OutboxMessageBriefDto[] }> => {
  await requireAdmin(event)
  const messages = await OutboxMessage.findAll({
    attributes: ['id', 'envelopeFrom', 'envelopeTo', 'subject', 'receivedAt'],
    order: [['receivedAt', 'DESC']],
    limit: 500,
  })
  return {
    local: usesLocalOutbox(),
    messages: messages.map(m => ({ id: m.id, from: m.envelopeFrom, to: m.envelopeTo, subject: m.subject, receivedAt: m.receivedAt.toISOString() })),
  }
})
