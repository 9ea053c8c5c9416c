/** The solver's problem when the server refused to freeze or send for review a network that does not solve; null for any other error. */
export function readUnsolvedProblem(error: unknown): string | null {
  const body = (error as { statusCode?: number; data?: { data?: { unsolved?: { problem?: unknown } } } })
  const problem = body?.data?.data?.unsolved?.problem
  return typeof problem === 'string' ? problem : null
}
