import { passwordResetRequestSchema } from '#shared/schemas/auth'

/**
 * "Forgot your password?": mails a reset link to the account with this address. Public, and it answers every
 * well-formed request with the same words after the same time, whether or not an account uses the address, so it
 * cannot be used to find out who has an account. Limited per client address (429) and per account (past the
 * hourly allowance nothing more is mailed, with the same answer).
 */
export default defineEventHandler(async (event) => {
  const started = Date.now()
  const body = await readBodyAs(event, passwordResetRequestSchema)
  await reservePasswordResetRequest(clientAddress(event))
  if (await takePasswordResetMail(body.email)) {
    // Not awaited: a slow mail relay must not make a known address answer later than an unknown one.
    sendPasswordResetLink(event, body.email).catch((error) => {
      console.error(`Portwright: password-reset link could not be made: ${(error as Error).message}`)
    })
  }
  const wait = started + PASSWORD_RESET_ANSWER_MS - Date.now()
  if (wait > 0) await new Promise(resolve => setTimeout(resolve, wait))
  return { message: PASSWORD_RESET_ANSWER }
})
