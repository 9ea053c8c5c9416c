/** What the API says went wrong: the overall message and per-field messages, ready for a form. */
export interface ServerErrors {
  message: string
  fields: Record<string, string>
}

/** Reads an error thrown by `$fetch` into a message and a field map. */
export function readServerErrors(error: unknown): ServerErrors {
  const body = (error as { data?: { message?: string; data?: { fields?: Record<string, string> } } })?.data
  return {
    message: body?.message ?? (error instanceof Error ? error.message : 'Something went wrong.'),
    fields: body?.data?.fields ?? {},
  }
}
