import { AccessToken } from '~~/server/database/models'
import type { AccessTokenDto } from '#shared/types/access-token'

/** The signed-in person's access tokens, newest first, never their secrets. Session only: a token cannot list tokens. */
export default defineEventHandler(async (event): Promise<AccessTokenDto[]> => {
  const user = await requireCurrentUser(event)
  const tokens = await AccessToken.findAll({ where: { userId: user.id }, order: [['createdAt', 'DESC']] })
  return accessTokenDtos(tokens)
})
