import type { NetworkDocument } from '../network/types'

/** Project roles, from most to least powerful. */
export const projectRoles = ['owner', 'editor', 'reviewer', 'viewer'] as const
export type ProjectRole = (typeof projectRoles)[number]

/** The signed-in user as the API reports it. */
export interface UserDto {
  id: string
  email: string
  name: string
  isAdmin: boolean
}

export interface ProjectDto {
  id: string
  name: string
  description: string
  role: ProjectRole
  createdAt: string
  updatedAt: string
}

export interface MemberDto {
  userId: string
  email: string
  name: string
  role: ProjectRole
}

export interface NetworkSummaryDto {
  id: string
  projectId: string
  name: string
  revision: number
  updatedAt: string
  updatedBy: string | null
}

/** A network with its full document; `revision` must be sent back on update. */
export interface NetworkDto extends NetworkSummaryDto {
  document: NetworkDocument
  role: ProjectRole
}

/** One signed-in browser of the current account, for the account page. */
export interface AccountSessionDto {
  id: string
  /** Browser and system read from the User-Agent ("Firefox on Linux"). */
  device: string
  userAgent: string
  createdAt: string
  lastSeenAt: string
  /** The session this request came with. */
  current: boolean
}

/** What an uploaded Touchstone file holds, read when it was stored. */
export interface StoredFileSummary {
  ports: number
  /** Hz. */
  startFrequency: number
  stopFrequency: number
  points: number
  /** Reference impedance of each port (Ω). */
  impedances: number[]
  /** As written in the file: version, parameter and number format, e.g. "1, S, MA". */
  version: string
  parameter: string
  format: string
  noisePoints: number
}

/** An uploaded data file of a project, as the Files list shows it. */
export interface StoredFileDto {
  id: string
  name: string
  size: number
  version: number
  summary: StoredFileSummary
  uploadedBy: string | null
  uploadedAt: string
}

/** A file's S-parameters for the solver: frequencies (Hz) and S in the solver's layout, as plain arrays. */
export interface StoredFileDataDto {
  name: string
  ports: number
  impedances: number[]
  frequencies: number[]
  re: number[]
  im: number[]
}
