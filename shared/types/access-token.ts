import type { ProjectRole } from './api'

/** Roles a token may be limited to; a token never acts as an owner. */
export const tokenRoleCeilings = ['viewer', 'reviewer', 'editor'] as const
export type TokenRoleCeiling = (typeof tokenRoleCeilings)[number]

/** Prefix of every Portwright personal access token, so a leaked one is recognisable in logs and scanners. */
export const ACCESS_TOKEN_PREFIX = 'pwt_'

/** Longest life of a token, in days. */
export const ACCESS_TOKEN_MAX_DAYS = 365

/** Most tokens one person may hold at once. */
export const ACCESS_TOKENS_PER_USER = 50

/** A token as its owner sees it in the list: never the secret. */
export interface AccessTokenDto {
  id: string
  name: string
  /** The first characters of the secret, e.g. `pwt_Ab12…`. */
  hint: string
  roleCeiling: TokenRoleCeiling
  projects: Array<{ id: string; name: string }>
  expiresAt: string
  lastUsedAt: string | null
  createdAt: string
  expired: boolean
}

/** The answer to creating a token: the secret, shown this once. */
export interface CreatedAccessTokenDto extends AccessTokenDto {
  token: string
}

/** What a token may do now (`GET /api/v1/token`): its effective role in each project of its scope. */
export interface TokenSelfDto {
  name: string
  expiresAt: string
  roleCeiling: TokenRoleCeiling
  projects: Array<{ id: string; name: string; role: ProjectRole }>
}

/** One network in `GET /api/v1/networks`. */
export interface AutomationNetworkDto {
  id: string
  name: string
  revision: number
  updatedAt: string
}
