import type { OutboxMessageBriefDto, OutboxMessageDto } from '../../shared/types/review'
import { ApiClient, signedIn } from './http'

let admin: ApiClient | undefined

/** The demo site administrator's client (the only one who may read the outbox). */
export async function adminClient(): Promise<ApiClient> {
  admin ??= await signedIn('ada@quillmere.example', 'quillmere-demo-2026')
  return admin
}

/** Every message in the local outbox (summaries), newest first. */
export async function outboxList(): Promise<OutboxMessageBriefDto[]> {
  const answer = await (await adminClient()).get('/api/admin/outbox')
  if (answer.status !== 200) throw new Error(`outbox: ${answer.status} ${JSON.stringify(answer.body)}`)
  return answer.body.messages
}

/** One message with its bodies. */
export async function outboxMessage(id: string): Promise<OutboxMessageDto> {
  const answer = await (await adminClient()).get(`/api/admin/outbox/${id}`)
  if (answer.status !== 200) throw new Error(`outbox message: ${answer.status} ${JSON.stringify(answer.body)}`)
  return answer.body
}

/**
 * Runs `action` and returns the messages it caused that went to any of `watched`, with their
 * bodies, oldest first. Mail is sent before the API answers, so nothing arrives later — except
 * from routes that answer at a fixed time whatever they mail (password reset): pass `expected`,
 * and the outbox is read again until that many messages came (for up to 10 s).
 */
export async function mailDuring(watched: string[], action: () => Promise<unknown>, expected = 0): Promise<OutboxMessageDto[]> {
  const before = new Set((await outboxList()).map(m => m.id))
  await action()
  const lower = new Set(watched.map(e => e.toLowerCase()))
  const deadline = Date.now() + 10_000
  for (;;) {
    const fresh = (await outboxList()).filter(m => !before.has(m.id) && m.to.some(t => lower.has(t.toLowerCase()))).reverse()
    if (fresh.length >= expected || Date.now() > deadline) return Promise.all(fresh.map(m => outboxMessage(m.id)))
    await new Promise(resolve => setTimeout(resolve, 100))
  }
}

/** The invitation token in a message's link. */
export function invitationToken(message: { text: string }): string {
  const match = message.text.match(/\/invitations\/([A-Za-z0-9_-]{43})/)
  if (!match) throw new Error(`no invitation link in: ${message.text}`)
  return match[1]!
}

/** The password-reset token in a message's link. */
export function resetToken(message: { text: string }): string {
  const match = message.text.match(/\/password-reset\/([A-Za-z0-9_-]{43})/)
  if (!match) throw new Error(`no reset link in: ${message.text}`)
  return match[1]!
}
