import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs'
import { randomBytes } from 'node:crypto'
import { dirname } from 'node:path'

/** The session secret: NUXT_SESSION_PASSWORD if set, else one generated once into a git-ignored file. */
export function sessionSecret(file: string): string {
  const fromEnv = process.env.NUXT_SESSION_PASSWORD
  if (fromEnv !== undefined) {
    if (fromEnv.length < 32) throw new Error('NUXT_SESSION_PASSWORD must be at least 32 characters.')
    return fromEnv
  }
  if (!existsSync(file)) {
    mkdirSync(dirname(file), { recursive: true })
    writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 })
  }
  const secret = readFileSync(file, 'utf8').trim()
  if (secret.length < 32) throw new Error(`${file} holds a session secret shorter than 32 characters; delete it to make a new one.`)
  return secret
}
