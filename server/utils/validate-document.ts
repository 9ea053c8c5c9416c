import { parseNetworkDocument } from '#shared/network/schema'
import type { NetworkDocument } from '#shared/network/types'

/** Checks a network document against the contract's schema; answers 422 listing every problem. */
export function requireValidDocument(input: unknown): NetworkDocument {
  const parsed = parseNetworkDocument(input)
  if (!parsed.ok) {
    const problems = parsed.problems
    const first = problems[0]
    throw createError({
      statusCode: 422,
      message: `The network document is not valid: ${first ? first.message : 'unknown problem'}${problems.length > 1 ? ` (and ${problems.length - 1} more)` : ''}`,
      data: { problems },
    })
  }
  return parsed.document
}
