import nodemailer from 'nodemailer'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startLocalSmtp, type LocalSmtp, type ReceivedMessage } from '../../../server/mail/local-smtp'

let smtp: LocalSmtp
const stored: ReceivedMessage[] = []

beforeAll(async () => {
  smtp = await startLocalSmtp(0, async (m) => { stored.push(m) })
})
afterAll(async () => { await smtp?.close() })

const transport = (pass: string) => nodemailer.createTransport({ host: smtp.host, port: smtp.port, secure: false, ignoreTLS: true, auth: { user: smtp.user, pass } })

describe('local stand-in SMTP server', () => {
  it('listens on loopback on a port of its own choosing', () => {
    expect(smtp.host).toBe('127.0.0.1')
    expect(smtp.port).toBeGreaterThan(0)
  })

  it('stores a message, parsed, before the sender hears back', async () => {
    await transport(smtp.pass).sendMail({ from: 'app@test.example', to: 'a@test.example', subject: 'Sweep ✓', text: 'plain', html: '<p>rich</p>' })
    expect(stored.at(-1)).toMatchObject({ envelopeFrom: 'app@test.example', envelopeTo: ['a@test.example'], subject: 'Sweep ✓', textBody: 'plain' })
    expect(stored.at(-1)!.htmlBody).toBe('<p>rich</p>')
    expect(stored.at(-1)!.raw).toContain('Subject:')
  })

  it('refuses a sender without its credentials, and stores nothing', async () => {
    const before = stored.length
    await expect(transport('wrong').sendMail({ from: 'x@test.example', to: 'a@test.example', subject: 'spoof', text: 'x' })).rejects.toThrow(/Invalid login|Authentication/i)
    expect(stored.length).toBe(before)
  })
})
