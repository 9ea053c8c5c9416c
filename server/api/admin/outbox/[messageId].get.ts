import { z } from 'zod'
import { OutboxMessage } from '~~/server/database/models'
import type { OutboxMessageDto } from '#shared/types/review'

/** One message of the local outbox with its text and HTML bodies (site administrators). */
export default defineEventHandler(async (event): Promise<OutboxMessageDto> => {
  const { messageId } = paramsAs(event, z.object({ messageId: z.uuid() }))
  await requireAdmin(event)
  const m = await OutboxMessage.findByPk(messageId)
  if (!m) throw createError({ statusCode: 404, message: 'Message not found.' })
  return { id: m.id, from: m.envelopeFrom, to: m.envelopeTo, subject: m.subject, receivedAt: m.receivedAt.toISOString(), text: m.textBody, html: m.htmlBody }
})
