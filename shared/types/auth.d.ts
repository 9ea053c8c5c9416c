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
}
export {}
