import { randomBytes } from 'node:crypto'
import type { AddressInfo } from 'node:net'
import { SMTPServer } from 'smtp-server'
import { simpleParser } from 'mailparser'

/** A message as the local stand-in received it. */
export interface ReceivedMessage {
  envelopeFrom: string
  envelopeTo: string[]
  subject: string
  textBody: string
  htmlBody: string
  raw: string
}

export interface LocalSmtp {
  host: string
  port: number
  user: string
  pass: string
  close(): Promise<void>
}

/** Largest message the stand-in accepts; ours are a few kilobytes. */
const MAX_BYTES = 5 * 1024 * 1024

/**
 * Starts an SMTP server on loopback that hands every message it receives to `store`
 * before answering 250, so a sender whose `sendMail` has resolved knows the message is
 * stored. It takes only the app's own submissions: a random user name and password,
 * made per start, are required (other local processes cannot drop mail into the outbox).
 * Port 0 picks a free port, so a start and a test run never collide.
 */
export async function startLocalSmtp(port: number, store: (message: ReceivedMessage) => Promise<void>): Promise<LocalSmtp> {
  const user = `portwright-${randomBytes(6).toString('hex')}`
  const pass = randomBytes(24).toString('base64url')
  const server = new SMTPServer({
    name: 'portwright-local-outbox',
    banner: 'Portwright local outbox (development and tests only)',
    authMethods: ['PLAIN', 'LOGIN'],
    // Loopback only, so no TLS; the credentials still keep other local senders out.
    allowInsecureAuth: true,
    disabledCommands: ['STARTTLS'],
    size: MAX_BYTES,
    logger: false,
    onAuth(auth, _session, callback) {
      if (auth.username === user && auth.password === pass) return callback(null, { user })
      return callback(new Error('Authentication refused'))
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = []
      stream.on('data', (chunk: Buffer) => chunks.push(chunk))
      stream.on('end', () => {
        if (stream.sizeExceeded) return callback(Object.assign(new Error('Message too large'), { responseCode: 552 }))
        const raw = Buffer.concat(chunks)
        simpleParser(raw)
          .then(parsed => store({
            envelopeFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            envelopeTo: session.envelope.rcptTo.map(r => r.address),
            subject: parsed.subject ?? '',
            textBody: parsed.text ?? '',
            htmlBody: typeof parsed.html === 'string' ? parsed.html : '',
            raw: raw.toString('utf8'),
          }))
          .then(() => callback(), (error: Error) => callback(Object.assign(new Error(`Could not store the message: ${error.message}`), { responseCode: 451 })))
      })
    },
  })
  const host = '127.0.0.1'
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, host, () => {
      server.off('error', reject)
      resolve()
    })
  })
  const bound = (server.server.address() as AddressInfo).port
  return { host, port: bound, user, pass, close: () => new Promise<void>(resolve => server.close(() => resolve())) }
}
