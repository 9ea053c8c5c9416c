import { signInSchema } from '#shared/schemas/auth'
import { User } from '~~/server/database/models'

// A real scrypt hash of a random string: verifying against it when the account is
// missing keeps the answer time the same whether or not the account exists.
let decoyHash: Promise<string> | undefined

/** Signs in with e-mail and password, within the per-account and per-address limits. */
export default defineEventHandler(async (event) => {
  const body = await readBodyAs(event, signInSchema)
  const address = clientAddress(event)
  // The point is taken before the password is looked at, so parallel guesses are each counted.
  await reserveSignInAttempt(body.email, address)
  useDatabase()
  const user = await User.findOne({ where: { email: body.email } })
  decoyHash ??= hashPassword(crypto.randomUUID())
  const valid = await verifyPassword(user?.passwordHash ?? await decoyHash, body.password)
  if (!user || !valid) {
    throw createError({ statusCode: 401, message: 'E-mail or password is wrong.' })
  }
  await signInSucceeded(body.email, address)
  await startAccountSession(event, user)
  return toUserDto(user)
})
