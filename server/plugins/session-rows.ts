/**
 * Whenever a session cookie is cleared — sign-out, nuxt-auth-utils' own DELETE /api/_auth/session, or a refused
 * session — the row it names is revoked on the server too, so a copy of the cookie is worthless afterwards.
 */
export default defineNitroPlugin(() => {
  sessionHooks.hook('clear', async (session) => {
    await revokeSessionBySecret(sessionSecretOf(session as { secure?: { sid?: unknown } }))
  })
})
