import { UniqueConstraintError } from 'sequelize'
import { signUpSchema } from '#shared/schemas/auth'
import { User } from '~~/server/database/models'

/** Creates an account and signs it in. */
export default defineEventHandler(async (event) => {
  const body = await readBodyAs(event, signUpSchema)
  await reserveSignUp(clientAddress(event))
  useDatabase()
  const passwordHash = await hashPassword(body.password)
  try {
    const user = await User.create({ email: body.email, name: body.name, passwordHash })
    await startAccountSession(event, user)
    await recordAudit('account.created', user.id, null, { email: user.email })
    setResponseStatus(event, 201)
    return toUserDto(user)
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      throw createError({ statusCode: 409, message: 'An account with this e-mail already exists; sign in instead.', data: { field: 'email' } })
    }
    throw error
  }
})
