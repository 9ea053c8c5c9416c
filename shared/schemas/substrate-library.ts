import { z } from 'zod'

/** Most boards one project's library holds. */
export const SUBSTRATE_LIBRARY_LIMIT = 200

const finite = (field: string) => z.number({ error: `${field} must be a number` }).refine(Number.isFinite, `${field} must be a finite number`)

/** The values of a library board, in SI units (metres, S/m), with bounds that keep the models meaningful. */
const substrateValues = {
  permittivity: finite('Relative permittivity').min(1, 'Relative permittivity must be at least 1.').max(128, 'Relative permittivity must be at most 128.'),
  height: finite('Height').gt(0, 'Height must be above 0 m.').max(0.1, 'Height must be at most 0.1 m (100 mm).'),
  thickness: finite('Conductor thickness').min(0, 'Conductor thickness cannot be negative.').max(0.01, 'Conductor thickness must be at most 0.01 m (10 mm).'),
  lossTangent: finite('Loss tangent').min(0, 'Loss tangent cannot be negative.').max(1, 'Loss tangent must be at most 1.'),
  conductivity: finite('Conductivity').gt(0, 'Conductivity must be above 0 S/m (leave it empty for lossless metal).').max(1e9, 'Conductivity must be at most 1e9 S/m.').nullable(),
  roughness: finite('Surface roughness').min(0, 'Surface roughness cannot be negative.').max(1e-4, 'Surface roughness must be at most 1e-4 m (100 µm).'),
  note: z.string().max(500, 'Note is too long (500 characters at most).'),
}

const substrateName = z.string().trim().min(1, 'Enter a substrate name.').max(80, 'Substrate name is too long (80 characters at most).')

/** Body of a new library board: name, permittivity and height required; the rest default to a lossless, smooth, zero-thickness strip. */
export const createLibrarySubstrateSchema = z.object({
  name: substrateName,
  permittivity: substrateValues.permittivity,
  height: substrateValues.height,
  thickness: substrateValues.thickness.default(0),
  lossTangent: substrateValues.lossTangent.default(0),
  conductivity: substrateValues.conductivity.default(null),
  roughness: substrateValues.roughness.default(0),
  note: substrateValues.note.default(''),
}).strict()

/** Body of a change to a library board: any of its fields. */
export const updateLibrarySubstrateSchema = z.object({
  name: substrateName.optional(),
  ...Object.fromEntries(Object.entries(substrateValues).map(([k, v]) => [k, v.optional()])) as { [K in keyof typeof substrateValues]: z.ZodOptional<(typeof substrateValues)[K]> },
}).strict().refine(v => Object.keys(v).length > 0, 'Send at least one field to change.')

/** A library board as the API returns it. */
export interface LibrarySubstrateDto {
  id: string
  name: string
  permittivity: number
  height: number
  thickness: number
  lossTangent: number
  conductivity: number | null
  roughness: number
  note: string
  updatedAt: string
}
