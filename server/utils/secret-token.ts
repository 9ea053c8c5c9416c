import { createHash, randomBytes } from 'node:crypto'

/** A new random secret (32 bytes, URL-safe: 43 characters) and the SHA-256 that is stored in its place. */
export function newSecretToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url')
  return { token, hash: hashSecretToken(token) }
}

/** SHA-256 of a secret token, hex: what the database keeps instead of the secret. */
export function hashSecretToken(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}
