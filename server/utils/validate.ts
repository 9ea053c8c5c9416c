import type { H3Event } from 'h3'
import type { z } from 'zod'

/** Turns zod issues into one 400 answer: a readable message plus a field → message map for forms. */
export function validationError(error: z.ZodError, what: string) {
  const fields: Record<string, string> = {}
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_'
    fields[key] ??= issue.message
  }
  const message = Object.entries(fields).map(([k, m]) => (k === '_' ? m : `${k}: ${m}`)).join(' ')
  return createError({ statusCode: 400, message: `Invalid ${what}. ${message}`, data: { fields } })
}

/** Reads and validates the JSON body; 400 naming each bad field. */
export async function readBodyAs<S extends z.ZodType>(event: H3Event, schema: S): Promise<z.infer<S>> {
  const body = await readBody(event).catch(() => {
    throw createError({ statusCode: 400, message: 'The request body is not valid JSON.' })
  })
  const result = schema.safeParse(body ?? {})
  if (!result.success) throw validationError(result.error, 'request')
  return result.data
}

/** Validates route parameters; a malformed id answers 404 like a missing one. */
export function paramsAs<S extends z.ZodType>(event: H3Event, schema: S): z.infer<S> {
  const result = schema.safeParse(getRouterParams(event))
  if (!result.success) throw createError({ statusCode: 404, message: 'Not found.' })
  return result.data
}

/** Validates the query string; 400 naming each bad parameter. */
export function queryAs<S extends z.ZodType>(event: H3Event, schema: S): z.infer<S> {
  const result = schema.safeParse(getQuery(event))
  if (!result.success) throw validationError(result.error, 'query')
  return result.data
}
