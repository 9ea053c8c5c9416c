import { randomUUID } from 'node:crypto'
import { appUrl } from './app'

export interface ApiAnswer<T = any> {
  status: number
  body: T
}

// Every test file loads this module afresh, so a counter would hand the same addresses to every file and
// their sign-ups would add up against the per-address limit. A random 10.x.y.z, unique within the file, does not.
const usedAddresses = new Set<string>()
function freshAddress(): string {
  for (;;) {
    const [a, b, c] = crypto.getRandomValues(new Uint8Array(3))
    const address = `10.${a}.${b}.${c! | 1}`
    if (!usedAddresses.has(address)) {
      usedAddresses.add(address)
      return address
    }
  }
}

/**
 * A cookie-keeping API client standing in for one browser. Each client gets its
 * own client address (X-Forwarded-For, trusted in the test server) so that
 * sign-in limits of one test do not leak into another.
 */
export class ApiClient {
  cookie = ''
  readonly address: string
  origin: string | null

  constructor(options: { address?: string; origin?: string | null } = {}) {
    this.address = options.address ?? freshAddress()
    this.origin = options.origin === undefined ? appUrl() : options.origin
  }

  async request<T = any>(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<ApiAnswer<T>> {
    const response = await fetch(appUrl(path), {
      method,
      redirect: 'manual',
      headers: {
        'x-forwarded-for': this.address,
        ...(this.cookie ? { cookie: this.cookie } : {}),
        ...(this.origin && method !== 'GET' ? { origin: this.origin } : {}),
        // FormData sets its own multipart content type with the boundary.
        ...(body !== undefined && !(body instanceof FormData) ? { 'content-type': 'application/json' } : {}),
        ...headers,
      },
      body: body === undefined ? undefined : body instanceof FormData ? body : JSON.stringify(body),
    })
    const setCookie = response.headers.getSetCookie()
    for (const line of setCookie) {
      const pair = line.split(';')[0]!
      const [name, value] = [pair.slice(0, pair.indexOf('=')), pair.slice(pair.indexOf('=') + 1)]
      const others = this.cookie.split('; ').filter(c => c && !c.startsWith(`${name}=`))
      this.cookie = [...others, ...(value ? [`${name}=${value}`] : [])].join('; ')
    }
    const text = await response.text()
    let parsed: unknown = text
    try { parsed = text ? JSON.parse(text) : null } catch { /* not JSON */ }
    return { status: response.status, body: parsed as T }
  }

  get<T = any>(path: string) { return this.request<T>('GET', path) }
  post<T = any>(path: string, body?: unknown) { return this.request<T>('POST', path, body ?? {}) }
  put<T = any>(path: string, body?: unknown) { return this.request<T>('PUT', path, body ?? {}) }
  patch<T = any>(path: string, body?: unknown) { return this.request<T>('PATCH', path, body ?? {}) }
  delete<T = any>(path: string) { return this.request<T>('DELETE', path) }
}

/** Password used for accounts made by tests. */
export const TEST_PASSWORD = 'test-password-long-enough'

/** Signs up a fresh account and returns its signed-in client. */
export async function newSignedInUser(name = 'Test Engineer'): Promise<{ client: ApiClient; id: string; email: string }> {
  const client = new ApiClient()
  const email = `t-${randomUUID()}@test.example`
  const answer = await client.post('/api/auth/signup', { email, name, password: TEST_PASSWORD })
  if (answer.status !== 201) throw new Error(`sign-up failed: ${answer.status} ${JSON.stringify(answer.body)}`)
  return { client, id: answer.body.id, email }
}

/** Signs in an existing account (e.g. a demo user). */
export async function signedIn(email: string, password: string): Promise<ApiClient> {
  const client = new ApiClient()
  const answer = await client.post('/api/auth/signin', { email, password })
  if (answer.status !== 200) throw new Error(`sign-in failed for ${email}: ${answer.status} ${JSON.stringify(answer.body)}`)
  return client
}

/** Multipart form data with one file in the field `file`, as a browser's upload sends it. */
export function fileForm(name: string, text: string): FormData {
  const form = new FormData()
  form.append('file', new Blob([text], { type: 'application/octet-stream' }), name)
  return form
}
