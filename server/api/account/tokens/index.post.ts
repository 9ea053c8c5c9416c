import { AccessToken, AccessTokenProject, Membership } from '~~/server/database/models'
import { createAccessTokenSchema } from '#shared/schemas/access-token'
import { ACCESS_TOKENS_PER_USER, type CreatedAccessTokenDto } from '#shared/types/access-token'

/**
 * Creates a personal access token for the signed-in person (session only: a token cannot make tokens). The
 * secret is in this answer alone; the database keeps its SHA-256. Every chosen project must be one of theirs.
 */
export default defineEventHandler(async (event): Promise<CreatedAccessTokenDto> => {
  const user = await requireCurrentUser(event)
  const body = await readBodyAs(event, createAccessTokenSchema)
  const projectIds = [...new Set(body.projects)]
  const memberships = await Membership.findAll({ where: { userId: user.id, projectId: projectIds }, attributes: ['projectId'] })
  if (memberships.length !== projectIds.length) {
    throw createError({ statusCode: 400, message: 'Invalid request. projects: choose only projects you are a member of.', data: { fields: { projects: 'Choose only projects you are a member of.' } } })
  }
  if (await AccessToken.count({ where: { userId: user.id } }) >= ACCESS_TOKENS_PER_USER) {
    throw createError({ statusCode: 409, message: `You have ${ACCESS_TOKENS_PER_USER} access tokens already; delete one you no longer use first.` })
  }
  const { secret, hash, hint } = newAccessTokenSecret()
  const token = await useDatabase().transaction(async (transaction) => {
    const made = await AccessToken.create({
      userId: user.id,
      name: body.name,
      tokenHash: hash,
      hint,
      roleCeiling: body.roleCeiling,
      expiresAt: new Date(Date.now() + body.expiresInDays * 86_400_000),
    }, { transaction })
    await AccessTokenProject.bulkCreate(projectIds.map(projectId => ({ tokenId: made.id, projectId })), { transaction })
    return made
  })
  await recordAudit('access-token.created', user.id, null, { tokenId: token.id, name: token.name, projects: projectIds, roleCeiling: token.roleCeiling })
  setResponseStatus(event, 201)
  const [dto] = await accessTokenDtos([token])
  return { ...dto!, token: secret }
})
