import type { NetworkDocument, Problem } from '~~/shared/network/types'
import { parseNetworkDocument } from '~~/shared/network/schema'

/** Read a JSON text as a network document: the document, or every problem in plain words. */
export function importDocument(text: string): { ok: true, document: NetworkDocument } | { ok: false, problems: Problem[] } {
  let data: unknown
  try {
    data = JSON.parse(text)
  }
  catch (error) {
    return { ok: false, problems: [{ message: `This file is not JSON: ${(error as Error).message}` }] }
  }
  return parseNetworkDocument(data)
}
