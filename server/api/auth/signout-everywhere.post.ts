/** Revokes every session of the signed-in user by bumping the session version. */
export default defineEventHandler(async (event) => {
  const user = await requireCurrentUser(event)
  await user.increment('sessionVersion')
  await clearUserSession(event)
  await recordAudit('account.signed-out-everywhere', user.id, null)
  return { signedOut: true }
})
