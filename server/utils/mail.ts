import { hostname } from 'node:os'
import type { H3Event } from 'h3'
import nodemailer, { type Transporter } from 'nodemailer'
import { OutboxMessage } from '~~/server/database/models'
import { startLocalSmtp, type LocalSmtp } from '~~/server/mail/local-smtp'
import type { MailContent } from '~~/server/mail/messages'

let transport: Promise<Transporter> | undefined
let local: LocalSmtp | undefined

/** Whether production SMTP settings are given; without them the local stand-in is used. */
export function usesLocalOutbox(): boolean {
  return !process.env.PORTWRIGHT_SMTP_HOST
}

async function createTransport(): Promise<Transporter> {
  const timeouts = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 20_000 }
  if (!usesLocalOutbox()) {
    const user = process.env.PORTWRIGHT_SMTP_USER
    return nodemailer.createTransport({
      host: process.env.PORTWRIGHT_SMTP_HOST,
      port: Number(process.env.PORTWRIGHT_SMTP_PORT ?? 587),
      // Port 465 speaks TLS from the first byte; others upgrade with STARTTLS, which is then required.
      secure: process.env.PORTWRIGHT_SMTP_SECURE ? process.env.PORTWRIGHT_SMTP_SECURE === '1' : Number(process.env.PORTWRIGHT_SMTP_PORT) === 465,
      requireTLS: process.env.PORTWRIGHT_SMTP_SECURE !== '1' && process.env.PORTWRIGHT_SMTP_REQUIRE_TLS !== '0',
      auth: user ? { user, pass: process.env.PORTWRIGHT_SMTP_PASSWORD ?? '' } : undefined,
      pool: true,
      ...timeouts,
    })
  }
  local = await startLocalSmtp(Number(process.env.PORTWRIGHT_OUTBOX_SMTP_PORT ?? 0), async (message) => {
    useDatabase()
    await OutboxMessage.create(message)
  })
  return nodemailer.createTransport({ host: local.host, port: local.port, secure: false, ignoreTLS: true, auth: { user: local.user, pass: local.pass }, ...timeouts })
}

/** Opens the mail path at start-up: the production relay, or the local stand-in and its outbox. */
export function startMailer(): Promise<Transporter> {
  // A failed start is forgotten, so the next message tries again rather than failing for good.
  transport ??= createTransport().catch((error) => {
    transport = undefined
    throw error
  })
  return transport
}

/** Closes the transport and, if it runs, the local stand-in (server shutdown). */
export async function stopMailer(): Promise<void> {
  const t = transport
  transport = undefined
  if (t) (await t.catch(() => undefined))?.close()
  await local?.close()
  local = undefined
}

/** The address messages come from. */
function sender(): string {
  return process.env.PORTWRIGHT_MAIL_FROM || 'Portwright <no-reply@portwright.invalid>'
}

/**
 * Sends one message to one recipient. A failing mail server must not undo the work the
 * request has already stored, so failures are logged and reported as `false`, not thrown.
 */
export async function sendMail(to: string, content: MailContent): Promise<boolean> {
  try {
    const t = await startMailer()
    await t.sendMail({ from: sender(), to, subject: content.subject, text: content.text, html: content.html })
    return true
  } catch (error) {
    console.error(`Portwright: could not send "${content.subject}" to ${to}: ${error instanceof Error ? error.message : error}`)
    return false
  }
}

/**
 * An absolute link into the app for e-mails: from PORTWRIGHT_PUBLIC_URL when set (the address users reach,
 * behind any proxy), otherwise the address this server listens on. Never from a request header: a forged
 * Host would otherwise put someone else's site into our mail (OWASP ASVS 5.0, V13 configuration).
 */
export function appLink(_event: H3Event, path: string): string {
  return `${appBaseUrl()}${path}`
}

/** The app's own address for links: PORTWRIGHT_PUBLIC_URL, else http://HOST:PORT as the server was started. */
export function appBaseUrl(): string {
  const configured = process.env.PORTWRIGHT_PUBLIC_URL?.replace(/\/+$/, '')
  if (configured) return configured
  const host = process.env.NITRO_HOST || process.env.HOST || '127.0.0.1'
  const port = process.env.NITRO_PORT || process.env.PORT || '3000'
  // A wildcard address is no place to send anyone; the machine's name is the best guess without configuration.
  const shown = host === '0.0.0.0' || host === '::' ? hostname() : host.includes(':') ? `[${host}]` : host
  return `http://${shown}:${port}`
}
