/**
 * Refuses request bodies over the limit before anything reads them (OWASP ASVS 5.0, V13: size limits at the
 * door). A declared Content-Length is checked at once; a body without one (chunked) is read here with a
 * running count and refused the moment it passes the limit, and what was read is kept for the route.
 */
import type { H3Event } from 'h3'
import { TOUCHSTONE_LIMITS } from '#shared/touchstone/limits'

const BODY_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])

// File uploads (and replacements) of a project carry up to the upload limit plus the multipart framing.
const UPLOAD_PATH = /^\/api\/projects\/[^/]+\/files(?:\/[^/]+)?\/?(?:\?.*)?$/
const UPLOAD_FRAMING = 64 * 1024

/** Largest request body accepted, in bytes (PORTWRIGHT_BODY_LIMIT_BYTES, default 2 MiB). */
export function bodyLimitBytes(): number {
  const configured = Number(process.env.PORTWRIGHT_BODY_LIMIT_BYTES)
  return Number.isFinite(configured) && configured > 0 ? configured : 2 * 1024 * 1024
}

function tooLarge(limit: number) {
  const mib = limit / (1024 * 1024)
  return createError({ statusCode: 413, message: `The request is larger than ${Number.isInteger(mib) ? `${mib} MiB` : `${limit} bytes`}, the most the server accepts.` })
}

function readWithin(event: H3Event, limit: number): Promise<Buffer> {
  const req = event.node.req
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = []
    let size = 0
    req.on('data', (chunk: Buffer) => {
      size += chunk.length
      if (size > limit) {
        req.removeAllListeners('data')
        req.resume()
        reject(tooLarge(limit))
        return
      }
      chunks.push(chunk)
    })
    req.on('end', () => resolve(Buffer.concat(chunks)))
    req.on('error', reject)
  })
}

export default defineEventHandler(async (event) => {
  if (!BODY_METHODS.has(event.method)) return
  const upload = (event.method === 'POST' || event.method === 'PUT') && UPLOAD_PATH.test(event.path)
  const limit = upload ? Math.max(bodyLimitBytes(), TOUCHSTONE_LIMITS.uploadBytes + UPLOAD_FRAMING) : bodyLimitBytes()
  const declared = getRequestHeader(event, 'content-length')
  if (declared !== undefined) {
    if (!/^\d+$/.test(declared) || Number(declared) > limit) throw tooLarge(limit)
    return
  }
  if (!getRequestHeader(event, 'transfer-encoding')) return
  // h3's body readers take a body already read from `req.body`.
  const body = await readWithin(event, limit);
  (event.node.req as unknown as { body: Buffer }).body = body
})
