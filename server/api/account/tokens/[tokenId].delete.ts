import { z } from 'zod'
import { AccessToken } from '~~/server/database/models'

/** Revokes one of the signed-in person's tokens at once (the row goes; its next request answers 401). Session only. */
export default defineEventHandler(async (event) => {
  const user = await requireCurrentUser(event)
  const { tokenId } = paramsAs(event, z.object({ tokenId: z.uuid() }))
  const token = await AccessToken.findOne({ where: { id: tokenId, userId: user.id } })
  if (!token) throw createError({ statusCode: 404, message: 'Access token not found.' })
  await token.destroy()
  await recordAudit('access-token.revoked', user.id, null, { tokenId: token.id, name: token.name })
  return { revoked: true }
})
