// Every route checks the session and the role before it reads a body or a query (OWASP ASVS 5.0, V4 access
// control: deny by default, check before any work). The test reads each route file, so a new route is covered.
import { readdirSync, readFileSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import { describe, expect, it } from 'vitest'

const root = join(import.meta.dirname, '..', '..', '..')
const apiDir = join(root, 'server', 'api')

function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name)
    return statSync(path).isDirectory() ? routeFiles(path) : name.endsWith('.ts') ? [path] : []
  })
}

// Routes that serve people without a session (signing out works with an ended one too).
const PUBLIC_ROUTES = new Set(['auth/signout.post.ts', 'auth/signin.post.ts', 'auth/signup.post.ts', 'auth/password-reset.post.ts', 'auth/password-reset/confirm.post.ts', 'health.get.ts', 'invitations/[token].get.ts', 'v1/openapi.json.get.ts'])
const READS = /\b(readBodyAs|queryAs|readBody|readValidatedBody|getQuery|readMultipartFormData|readRawBody)\s*\(/
// requireToken is the bearer gate of /api/v1 (cookies are never read there); requireTokenProjectRole follows it.
const GATES = /\b(requireProjectRole|requireCurrentUser|requireCurrentSession|requireAdmin|requireToken)\s*\(/

describe('route handlers: gate, then body, then work', () => {
  const files = routeFiles(apiDir)

  it('finds the route files', () => {
    expect(files.length).toBeGreaterThan(30)
  })

  for (const file of files) {
    const name = relative(apiDir, file).replaceAll('\\', '/')
    if (PUBLIC_ROUTES.has(name)) continue
    it(`${name} checks the session and role before reading input`, () => {
      const source = readFileSync(file, 'utf8')
      const gate = source.search(GATES)
      expect(gate, 'the handler has no session or role gate').toBeGreaterThanOrEqual(0)
      const read = source.search(READS)
      if (read >= 0) expect(read, 'input is read before the gate').toBeGreaterThan(gate)
    })
  }
})
