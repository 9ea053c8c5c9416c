/** Ends this browser's session: its row is revoked on the server (server/plugins/session-rows.ts) and the cookie cleared. */
export default defineEventHandler(async (event) => {
  await clearUserSession(event)
  return { signedOut: true }
})
