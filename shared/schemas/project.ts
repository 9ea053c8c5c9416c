import { z } from 'zod'
import { projectRoles } from '../types/api'

const projectName = z.string().trim().min(1, 'Enter a project name.').max(120, 'Project name is too long (120 characters at most).')

/** Body of project creation. */
export const createProjectSchema = z.object({
  name: projectName,
  description: z.string().trim().max(2000, 'Description is too long (2000 characters at most).').default(''),
})

/** Body of project rename / description change. */
export const updateProjectSchema = z.object({
  name: projectName.optional(),
  description: z.string().trim().max(2000, 'Description is too long (2000 characters at most).').optional(),
}).refine(v => v.name !== undefined || v.description !== undefined, { message: 'Nothing to change: give a name or a description.' })

/** A role name, as sent by clients. */
export const roleSchema = z.enum(projectRoles, { message: `Role must be one of: ${projectRoles.join(', ')}.` })

/** Body of adding a member by e-mail. */
export const addMemberSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter a valid e-mail address.' })),
  role: roleSchema,
})

/** Body of changing a member's role. */
export const changeRoleSchema = z.object({ role: roleSchema })
