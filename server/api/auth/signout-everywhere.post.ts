/** Ends every session of the signed-in user: every session row is revoked and the session version bumped. */
export default defineEventHandler(async (event) => {
  const user = await requireCurrentUser(event)
  await user.increment('sessionVersion')
  await revokeSessionsOf(user.id)
  await clearUserSession(event)
  await liveSessionsChanged()
  await recordAudit('account.signed-out-everywhere', user.id, null)
  return { signedOut: true }
})
