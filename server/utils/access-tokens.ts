import type { H3Event } from 'h3'
import { createHash, randomBytes } from 'node:crypto'
import { z } from 'zod'
import { Op } from 'sequelize'
import { AccessToken, AccessTokenProject, Membership, Project, User } from '~~/server/database/models'
import { ACCESS_TOKEN_PREFIX, type AccessTokenDto } from '#shared/types/access-token'
import { effectiveTokenRole } from '#shared/automation/effective-role'
import type { ProjectRole } from '#shared/types/api'

/** A token's secret: the prefix and 32 random bytes (256 bits) in base64url. */
const TOKEN_PATTERN = new RegExp(`^${ACCESS_TOKEN_PREFIX}[A-Za-z0-9_-]{43}$`)

/** SHA-256 (hex) of a token's secret: what the database keeps and looks up. */
export function hashAccessToken(secret: string): string {
  return createHash('sha256').update(secret).digest('hex')
}

/** A new secret with its hash and the hint shown in lists. */
export function newAccessTokenSecret(): { secret: string; hash: string; hint: string } {
  const secret = `${ACCESS_TOKEN_PREFIX}${randomBytes(32).toString('base64url')}`
  return { secret, hash: hashAccessToken(secret), hint: secret.slice(0, ACCESS_TOKEN_PREFIX.length + 4) }
}


/** The token, its owner and when it was checked: what a bearer request acts with. */
export interface TokenAccess {
  token: AccessToken
  user: User
}

function refused(): never {
  throw createError({ statusCode: 401, message: 'This needs a valid personal access token: send "Authorization: Bearer pwt_…" (create one on your account page).' })
}

/**
 * The gate of every `/api/v1` route: the bearer token of the request, read from the database on every call.
 * A missing, malformed, unknown, expired or deleted token answers 401; so does one whose owner is gone. Cookies
 * are never consulted, so a browser session cannot be used here, nor a token on any other route.
 */
export async function requireToken(event: H3Event): Promise<TokenAccess> {
  const header = getRequestHeader(event, 'authorization') ?? ''
  const match = /^Bearer\s+(\S+)\s*$/i.exec(header)
  const secret = match?.[1]
  if (!secret || !TOKEN_PATTERN.test(secret)) refused()
  useDatabase()
  const token = await AccessToken.findOne({ where: { tokenHash: hashAccessToken(secret) } })
  if (!token) refused()
  if (token.expiresAt.getTime() <= Date.now()) {
    throw createError({ statusCode: 401, message: `This access token expired on ${token.expiresAt.toISOString().slice(0, 10)}; create a new one on your account page.` })
  }
  const user = await User.findByPk(token.userId)
  if (!user) refused()
  await noteTokenUse(token.id)
  return { token, user }
}

/** Records the token's last use, at most once a minute (one conditional UPDATE, no read). */
async function noteTokenUse(tokenId: string): Promise<void> {
  await AccessToken.update({ lastUsedAt: new Date() }, {
    where: { id: tokenId, [Op.or]: [{ lastUsedAt: null }, { lastUsedAt: { [Op.lt]: new Date(Date.now() - 60_000) } }] },
  })
}

export interface TokenProjectAccess extends TokenAccess {
  project: Project
  role: ProjectRole
}

const projectId = z.uuid()

/**
 * The project check after `requireToken`: the token must name the project in its scope and its owner must still
 * be a member (read now, so a removed member loses access at once); the effective role is the lower of the
 * token's ceiling and the membership role. Outside the scope or the membership: 404, as for a project that does
 * not exist; below `needed`: 403.
 */
export async function requireTokenProjectRole(access: TokenAccess, project: string, needed: ProjectRole): Promise<TokenProjectAccess> {
  const notFound = () => createError({ statusCode: 404, message: 'Project not found (or not in this token\'s scope).' })
  const parsed = projectId.safeParse(project)
  if (!parsed.success) throw notFound()
  const [inScope, membership] = await Promise.all([
    AccessTokenProject.findOne({ where: { tokenId: access.token.id, projectId: parsed.data } }),
    Membership.findOne({ where: { projectId: parsed.data, userId: access.user.id } }),
  ])
  const found = inScope && membership && await Project.findByPk(parsed.data)
  if (!found) throw notFound()
  const role = effectiveTokenRole(access.token.roleCeiling, membership.role)
  if (!roleAtLeast(role, needed)) {
    throw createError({ statusCode: 403, message: `This needs the ${needed} role or higher; this token acts as ${role} in the project.` })
  }
  return { ...access, project: found, role }
}

/** The list entries of tokens, with their projects' names. */
export async function accessTokenDtos(tokens: AccessToken[]): Promise<AccessTokenDto[]> {
  const links = tokens.length ? await AccessTokenProject.findAll({ where: { tokenId: tokens.map(t => t.id) } }) : []
  const projects = links.length ? await Project.findAll({ where: { id: [...new Set(links.map(l => l.projectId))] }, attributes: ['id', 'name'] }) : []
  const names = new Map(projects.map(p => [p.id, p.name]))
  const now = Date.now()
  return tokens.map(t => ({
    id: t.id,
    name: t.name,
    hint: `${t.hint}…`,
    roleCeiling: t.roleCeiling,
    projects: links.filter(l => l.tokenId === t.id).map(l => ({ id: l.projectId, name: names.get(l.projectId) ?? '' })),
    expiresAt: t.expiresAt.toISOString(),
    lastUsedAt: t.lastUsedAt ? t.lastUsedAt.toISOString() : null,
    createdAt: t.createdAt.toISOString(),
    expired: t.expiresAt.getTime() <= now,
  }))
}
