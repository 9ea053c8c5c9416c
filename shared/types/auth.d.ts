// The session carries identity only; roles are read from the database on every request.
declare module '#auth-utils' {
  interface User {
    id: string
    email: string
    name: string
  }
  interface UserSession {
    /** Per-user session version; bumping it in the database revokes every session. */
    version: number
  }
  interface SecureSessionData {
    /** Secret naming this browser's row in `sessions` (only its SHA-256 is stored); absent in cookies made before server-side sessions. */
    sid?: string
  }
}
export {}
