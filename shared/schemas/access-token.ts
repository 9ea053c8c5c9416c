import { z } from 'zod'
import { ACCESS_TOKEN_MAX_DAYS, tokenRoleCeilings } from '../types/access-token'
import { DOCUMENT_LIMITS } from '../network/limits'

const uuid = (what: string) => z.uuid({ message: `${what} must be a project id (a UUID).` })

/** Body of creating a personal access token: a name, the projects it reaches, its role ceiling and life. */
export const createAccessTokenSchema = z.object({
  name: z.string().trim().min(1, 'Give the token a name, such as the script that will use it.').max(80, 'Name is too long (80 characters at most).'),
  projects: z.array(uuid('Each project')).min(1, 'Choose at least one project.').max(50, 'Too many projects (50 at most).'),
  roleCeiling: z.enum(tokenRoleCeilings, { message: `Role ceiling must be one of: ${tokenRoleCeilings.join(', ')}.` }),
  expiresInDays: z.number({ message: 'Give the number of days until the token expires.' }).int('Days must be a whole number.')
    .min(1, 'A token lives at least 1 day.').max(ACCESS_TOKEN_MAX_DAYS, `A token lives at most ${ACCESS_TOKEN_MAX_DAYS} days.`),
})

const frequency = z.union([z.number().finite().nonnegative(), z.string().max(100, 'A frequency is at most 100 characters.')])

/** Sweep override of an API solve: frequencies in hertz or with units. */
export const apiSweepSchema = z.object({
  start: frequency.optional(),
  stop: frequency.optional(),
  points: z.number().int('points must be a whole number.').min(1, 'points must be at least 1.').max(DOCUMENT_LIMITS.sweepPoints, `At most ${DOCUMENT_LIMITS.sweepPoints.toLocaleString('en')} points per request; split the band into several requests.`).optional(),
  spacing: z.enum(['linear', 'log'], { message: 'spacing must be linear or log.' }).optional(),
}).strict()

/** Body of `POST /api/v1/solve`: a document (with an optional project for its subnetworks) or a stored network. */
export const apiSolveSchema = z.union([
  z.object({ document: z.record(z.string(), z.unknown(), { message: 'document must be a network document (a JSON object).' }), project: uuid('project').optional(), sweep: apiSweepSchema.optional() }).strict(),
  z.object({ project: uuid('project'), network: z.uuid({ message: 'network must be a network id (a UUID).' }), sweep: apiSweepSchema.optional() }).strict(),
], { message: 'Send either { "document": {...}, "project"?: id } or { "project": id, "network": id }, each with an optional "sweep".' })

/** Query of `GET /api/v1/networks`. */
export const apiNetworksQuerySchema = z.object({ project: uuid('project') })
